import type { TActor } from "@/lib/authz/actor";
import { getDb } from "@/db/client";
import { auditTokenRequest, authenticateRequest, withIdempotency } from "@/features/api";
import { jsonError, unauthenticated } from "@/app/api/_lib/errors";

export { jsonError, forbidden, notFound, unauthenticated } from "@/app/api/_lib/errors";

export type TActorContext = { req: Request; actor: TActor; params: Record<string, string> };

type TRouteContext = { params: Promise<Record<string, string | string[] | undefined>> };

/** Catch-all segments arrive as arrays; handlers get them joined with "/". */
function flattenParams(raw: Record<string, string | string[] | undefined>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (value !== undefined) out[key] = Array.isArray(value) ? value.join("/") : value;
  }
  return out;
}

/**
 * Wraps a route handler so it runs only for a signed-in member or the holder of a valid API
 * token (`Authorization: Bearer`); anyone else gets 401 JSON, a token over its rate limit 429.
 * The handler still asks `can(actor, ...)` for what it does: signed in is not authorized, and a
 * token's scopes narrow `can` further. A POST with an Idempotency-Key runs at most once.
 */
export function withActor(handler: (ctx: TActorContext) => Promise<Response>) {
  return async (req: Request, context: TRouteContext): Promise<Response> => {
    const db = getDb();
    const auth = await authenticateRequest(db, req);
    if (!auth) return unauthenticated();
    if (!auth.ok) {
      const res = jsonError(auth.status, auth.code, auth.message);
      for (const [k, v] of Object.entries(auth.headers)) res.headers.set(k, v);
      return res;
    }
    const { actor } = auth;
    const params = flattenParams((await context?.params) ?? {});
    const res = await withIdempotency(db, req, actor, () => handler({ req, actor, params }));
    await auditTokenRequest(db, req, actor, res.status);
    return res;
  };
}
