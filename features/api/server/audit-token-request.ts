import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { clientIp, recordAudit } from "@/features/auth";

const CHANGES = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * Every change made with an API token goes into the dealership's audit log with the token's
 * name, the route and the answer (reads only move the token's last-used time).
 */
export async function auditTokenRequest(
  db: DbOrTx,
  req: Request,
  actor: TActor,
  status: number,
): Promise<void> {
  if (!actor.apiToken || !CHANGES.has(req.method)) return;
  await recordAudit(db, {
    kind: "api_request",
    dealershipIds: [actor.dealershipId],
    actorUserId: actor.userId,
    subject: actor.apiToken.name,
    detail: {
      tokenId: actor.apiToken.id,
      method: req.method,
      path: new URL(req.url).pathname,
      status,
    },
    ip: clientIp(req.headers),
  });
}
