import "server-only";

/** A download: the body with its content type and a file name the browser saves it under. */
export function attachment(body: BodyInit, contentType: string, fileName: string): Response {
  return new Response(body, {
    headers: {
      "content-type": contentType,
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
}
