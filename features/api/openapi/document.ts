import "server-only";
import { OpenAPIRegistry, OpenApiGeneratorV31 } from "@asteasolutions/zod-to-openapi";
import { API_SCOPES, SCOPE_LABELS } from "@/lib/authz/api-scopes";
import { registerPaths } from "@/features/api/openapi/paths";
import { ZApiError } from "@/features/api/openapi/common";

export type TOpenApiDocument = ReturnType<OpenApiGeneratorV31["generateDocument"]>;

let cached: TOpenApiDocument | undefined;

/**
 * The OpenAPI 3.1 document of /api/v1, generated from the same zod schemas the routes validate
 * with (request bodies, queries) and the response schemas beside them. Built once per process.
 */
export function getOpenApiDocument(): TOpenApiDocument {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  registry.register("Error", ZApiError);
  registry.registerComponent("securitySchemes", "bearerToken", {
    type: "http",
    scheme: "bearer",
    description: `An API token made by a dealer admin under Settings → API tokens. Scopes: ${API_SCOPES.map((s) => `\`${s}\` (${SCOPE_LABELS[s]})`).join(", ")}. Each token has its own requests-per-minute limit (429 with Retry-After past it).`,
  });
  registry.registerComponent("securitySchemes", "sessionCookie", {
    type: "apiKey",
    in: "cookie",
    name: "authjs.session-token",
    description: "The browser session of a signed-in person.",
  });
  registerPaths(registry);
  cached = new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: "3.1.0",
    info: {
      title: "Treadcast API",
      version: "1.0.0",
      description:
        "Customers, machines, duty cycles, estimates, option studies and quote reports of one dealership. SI units (m, N, J, s; degrees for angles); money in the dealership's currency. Every error is `{ error: { code, message, fieldErrors? } }`. Creating POSTs accept an `Idempotency-Key` header. Estimates are engineering estimates: take tyre load, pressure and speed limits from the tyre and machine makers' data.",
    },
    servers: [{ url: "/" }],
    security: [{ bearerToken: [] }, { sessionCookie: [] }],
    tags: [
      { name: "Customers" },
      { name: "Machines" },
      { name: "Duty cycles" },
      { name: "Estimates" },
      { name: "Options" },
      { name: "Reports" },
      { name: "Tread readings" },
      { name: "Billing" },
      { name: "Meta" },
    ],
  });
  return cached;
}
