/** JSON error bodies shared by every route handler: `{ error: { code, message, fieldErrors? } }`. */
export type TErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "invalid_input"
  | "conflict"
  | "rate_limited"
  | "internal";

export function jsonError(
  status: number,
  code: TErrorCode | (string & {}),
  message: string,
  fieldErrors?: Record<string, string[] | string>,
): Response {
  return Response.json(
    { error: { code, message, ...(fieldErrors ? { fieldErrors } : {}) } },
    { status, headers: { "cache-control": "no-store" } },
  );
}

export function unauthenticated(): Response {
  return jsonError(401, "unauthenticated", "Sign in to continue.");
}

/** The caller may see the resource but not do this to it. */
export function forbidden(message = "Your role does not allow this."): Response {
  return jsonError(403, "forbidden", message);
}

/** Also the answer for another dealership's resources, so their existence does not leak. */
export function notFound(what = "That record"): Response {
  return jsonError(404, "not_found", `${what} was not found.`);
}
