"use client";

import dynamic from "next/dynamic";
import "swagger-ui-react/swagger-ui.css";

// Swagger UI is bundled with the app (no CDN) and only runs in the browser: it measures the
// page and keeps its own state, so it is never rendered on the server.
const SwaggerUI = dynamic(() => import("swagger-ui-react"), {
  ssr: false,
  loading: () => <p className="text-sm text-ink-600">Loading the API reference…</p>,
});

/** The OpenAPI document, rendered as an interactive reference ("Try it out" uses your session). */
export function ApiReference({ url }: { url: string }) {
  return (
    <div className="treadcast-api-reference rounded-md bg-white" data-testid="api-reference">
      <SwaggerUI
        url={url}
        docExpansion="list"
        defaultModelsExpandDepth={0}
        tryItOutEnabled={false}
      />
    </div>
  );
}
