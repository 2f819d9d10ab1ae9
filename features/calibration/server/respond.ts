import "server-only";
import { CalibrationError } from "@/features/calibration/server/errors";

const noStore = { "cache-control": "no-store" };
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Runs one verb for a route handler: its value (JSON, or a Response as is) or its refusal. */
export async function respond<T>(run: () => Promise<T>, status = 200): Promise<Response> {
  try {
    const value = await run();
    if (value instanceof Response) return value;
    return Response.json(value, { status, headers: noStore });
  } catch (e) {
    if (!(e instanceof CalibrationError)) throw e;
    const { code, message, fieldErrors, detail } = e;
    return Response.json(
      { error: { code, message, ...(fieldErrors ? { fieldErrors } : {}), ...(detail ?? {}) } },
      { status: e.status, headers: noStore },
    );
  }
}

export async function readJson(req: Request): Promise<unknown> {
  const text = await req.text();
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new CalibrationError(400, "invalid_json", "The request body is not valid JSON.");
  }
}

/** A path id that is not a UUID names no record: 404 like any unknown id. */
export function pathId(value: string | undefined, what: string): string {
  if (!value || !UUID.test(value)) throw notFoundOf(what);
  return value;
}

const notFoundOf = (what: string) =>
  new CalibrationError(404, "not_found", `No ${what} with that id in your workspace.`);

export function queryOf(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of new URL(req.url).searchParams) if (value !== "") out[key] = value;
  return out;
}
