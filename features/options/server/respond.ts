import "server-only";
import { OptionsError } from "./errors";

const NO_STORE = { "cache-control": "no-store" };

/** Runs one verb and answers JSON, or the verb's refusal in the API's error shape. */
export async function respond<T>(run: () => Promise<T>, status = 200): Promise<Response> {
  try {
    return Response.json(await run(), { status, headers: NO_STORE });
  } catch (e) {
    if (!(e instanceof OptionsError)) throw e;
    const fieldErrors = e.fieldErrors ? { fieldErrors: e.fieldErrors } : {};
    return Response.json(
      { error: { code: e.code, message: e.message, ...fieldErrors } },
      { status: e.status, headers: NO_STORE },
    );
  }
}

export async function readBody(req: Request): Promise<unknown> {
  const text = await req.text();
  if (!text.trim()) return {};
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new OptionsError(400, "invalid_json", "The request body is not valid JSON.");
  }
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function studyId(value: string | undefined, what: string): string {
  if (!value || !UUID.test(value))
    throw new OptionsError(404, "not_found", `No ${what} with that id in your workspace.`);
  return value;
}

export function queryOf(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of new URL(req.url).searchParams) if (value !== "") out[key] = value;
  return out;
}
