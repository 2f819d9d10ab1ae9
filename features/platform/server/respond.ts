import "server-only";
import { ApiError } from "@/features/platform/server/api-error";

/**
 * Runs one server verb for a route handler and answers JSON: the verb's value with `status`,
 * or its refusal as `{ error: { code, message, fieldErrors?, ...detail } }` (the API's error shape).
 */
export async function respond<T>(run: () => Promise<T>, status = 200): Promise<Response> {
  try {
    const value = await run();
    return Response.json(value, { status, headers: { "cache-control": "no-store" } });
  } catch (e) {
    if (e instanceof ApiError) {
      return Response.json(
        {
          error: {
            code: e.code,
            message: e.message,
            ...(e.fieldErrors ? { fieldErrors: e.fieldErrors } : {}),
            ...(e.detail ?? {}),
          },
        },
        { status: e.status, headers: { "cache-control": "no-store" } },
      );
    }
    throw e;
  }
}

/** Reads a JSON body; a body that is not JSON is the caller's mistake (400), not a crash. */
export async function readJson(req: Request): Promise<unknown> {
  const text = await req.text();
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new ApiError(400, "invalid_json", "The request body is not valid JSON.");
  }
}

/** `?confirm=true` on a DELETE. */
export function confirmed(req: Request): boolean {
  return new URL(req.url).searchParams.get("confirm") === "true";
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not a UUID cannot name a record: answer 404 as for any unknown id. */
export function pathId(value: string | undefined, what: string): string {
  if (!value || !UUID.test(value))
    throw new ApiError(404, "not_found", `No ${what} with that id in your workspace.`);
  return value;
}

/** The query string as a plain object (empty values dropped), for a list schema. */
export function queryOf(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of new URL(req.url).searchParams) if (value !== "") out[key] = value;
  return out;
}
