import type { TActor } from "@/lib/authz/actor";
import { getActorFromRequest } from "@/features/auth/server/get-actor";
import { unauthenticated } from "@/app/api/_lib/errors";

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
 * Wraps a route handler so it runs only for a signed-in member; anyone else gets 401 JSON.
 * The handler still asks `can(actor, ...)` for what it does: signed in is not authorized.
 */
export function withActor(handler: (ctx: TActorContext) => Promise<Response>) {
  return async (req: Request, context: TRouteContext): Promise<Response> => {
    const actor = await getActorFromRequest(req);
    if (!actor) return unauthenticated();
    const params = flattenParams((await context?.params) ?? {});
    return handler({ req, actor, params });
  };
}
