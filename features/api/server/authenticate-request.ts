import "server-only";
import { and, eq, isNull, lt, or, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { apiTokens, dealerships, memberships, users } from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";
import { grantsOfScopes } from "@/lib/authz/api-scopes";
import { STAFF_ROLES } from "@/lib/authz/policy";
import { clientIp, getActorFromRequest, hitRateLimit, recordAudit } from "@/features/auth";
import { hashTokenSecret } from "@/features/api/server/token-secret";

export type TRequestAuth =
  | { ok: true; actor: TActor }
  | {
      ok: false;
      status: 401 | 429;
      code: string;
      message: string;
      headers: Record<string, string>;
    };

const BEARER = /^Bearer\s+(\S+)\s*$/i;

/** RFC 6750 §3: a refused bearer token says why in WWW-Authenticate. */
function refused(message: string): TRequestAuth {
  return {
    ok: false,
    status: 401,
    code: "unauthenticated",
    message,
    headers: { "www-authenticate": `Bearer realm="treadcast", error="invalid_token"` },
  };
}

/**
 * Who is asking an /api/v1 route: the holder of an `Authorization: Bearer` token (which wins
 * when both are sent), else the signed-in person behind the session cookie. A token is counted
 * against its per-minute limit on every request, in PostgreSQL so every app instance shares it.
 */
export async function authenticateRequest(db: DbOrTx, req: Request): Promise<TRequestAuth | null> {
  const header = req.headers.get("authorization");
  const bearer = header ? BEARER.exec(header)?.[1] : undefined;
  if (!bearer) {
    const actor = await getActorFromRequest(req);
    return actor ? { ok: true, actor } : null;
  }
  const [row] = await db
    .select({
      token: apiTokens,
      email: users.email,
      userName: users.name,
      unitSystem: users.unitSystem,
      currency: dealerships.currency,
    })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.createdById))
    .innerJoin(dealerships, eq(dealerships.id, apiTokens.dealershipId))
    .where(eq(apiTokens.secretHash, hashTokenSecret(bearer)));
  if (!row) return refused("That API token is not valid. Check it was copied whole.");
  const { token } = row;
  const ip = clientIp(req.headers);
  const now = new Date();
  const gone = token.revokedAt
    ? `This API token was revoked on ${token.revokedAt.toISOString()}.`
    : token.expiresAt && token.expiresAt <= now
      ? `This API token expired on ${token.expiresAt.toISOString()}.`
      : null;
  if (gone) {
    await recordAudit(db, {
      kind: "api_token_refused",
      dealershipIds: [token.dealershipId],
      subject: token.name,
      detail: { tokenId: token.id, reason: token.revokedAt ? "revoked" : "expired" },
      ip,
    });
    return refused(`${gone} Ask a dealer admin for a new one.`);
  }
  // The token acts for its maker, so it can do no more than they still may.
  const roleRows = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(
      and(
        eq(memberships.userId, token.createdById),
        eq(memberships.dealershipId, token.dealershipId),
      ),
    );
  const roles = roleRows.map((r) => r.role as TRole).filter((r) => STAFF_ROLES.includes(r));
  if (roles.length === 0)
    return refused(
      "The person who made this API token no longer works in this dealership. Ask a dealer admin for a new one.",
    );
  const limit = await hitRateLimit(db, {
    key: `api-token:${token.id}`,
    limit: token.requestsPerMinute,
    windowSeconds: 60,
  });
  if (!limit.allowed) {
    // One audit line per window, not one per refused request.
    if (limit.hits === token.requestsPerMinute + 1)
      await recordAudit(db, {
        kind: "api_token_rate_limited",
        dealershipIds: [token.dealershipId],
        subject: token.name,
        detail: { tokenId: token.id, limitPerMinute: token.requestsPerMinute },
        ip,
      });
    return {
      ok: false,
      status: 429,
      code: "rate_limited",
      message: `This API token may make ${token.requestsPerMinute} requests a minute. Retry after ${limit.retryAfterSeconds} s.`,
      headers: { "retry-after": String(Math.max(1, limit.retryAfterSeconds)) },
    };
  }
  // Written at most every 30 s per token, so a busy integration does not rewrite the row each call.
  await db
    .update(apiTokens)
    .set({ lastUsedAt: now })
    .where(
      and(
        eq(apiTokens.id, token.id),
        or(
          isNull(apiTokens.lastUsedAt),
          lt(apiTokens.lastUsedAt, sql`now() - interval '30 seconds'`),
        ),
      ),
    );
  return {
    ok: true,
    actor: {
      userId: token.createdById,
      email: row.email,
      name: row.userName,
      dealershipId: token.dealershipId,
      roles,
      customerId: null,
      unitSystem: row.unitSystem,
      currency: row.currency,
      apiToken: { id: token.id, name: token.name, grants: grantsOfScopes(token.scopes) },
    },
  };
}
