import "server-only";
import { DutyCycleError } from "@/features/duty-cycles/server/errors";

const noStore = { "cache-control": "no-store" };

/** Runs one verb for a route handler: its value as JSON, or its refusal as a JSON error. */
export async function respond<T>(run: () => Promise<T>, status = 200): Promise<Response> {
  try {
    const value = await run();
    if (value instanceof Response) return value;
    return Response.json(value, { status, headers: noStore });
  } catch (e) {
    if (!(e instanceof DutyCycleError)) throw e;
    return Response.json(
      {
        error: {
          code: e.code,
          message: e.message,
          ...(e.fieldErrors ? { fieldErrors: e.fieldErrors } : {}),
        },
      },
      { status: e.status, headers: noStore },
    );
  }
}

export async function readJsonBody(req: Request): Promise<unknown> {
  const text = await req.text();
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new DutyCycleError(400, "invalid_json", "The request body is not valid JSON.");
  }
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not a UUID cannot name a record: 404 as for any unknown id. */
export function idParam(value: string | undefined, what: string): string {
  if (!value || !UUID.test(value))
    throw new DutyCycleError(404, "not_found", `No ${what} with that id in your dealership.`);
  return value;
}

export function searchParamsOf(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of new URL(req.url).searchParams) if (value !== "") out[key] = value;
  return out;
}
