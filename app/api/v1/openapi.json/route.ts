import { getOpenApiDocument } from "@/features/api/openapi/document";

export const dynamic = "force-static";

/** The OpenAPI 3.1 document of /api/v1. Public: it describes the API, not anyone's data. */
export function GET(): Response {
  return Response.json(getOpenApiDocument(), {
    headers: { "cache-control": "public, max-age=300" },
  });
}
