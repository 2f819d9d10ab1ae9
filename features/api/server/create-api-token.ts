import "server-only";
import type { DbOrTx } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { recordAudit } from "@/features/auth";
import { ApiError, parseOrThrow } from "@/features/platform";
import { ZCreateApiTokenInput } from "@/features/api/schemas/api-token";
import { hashTokenSecret, newTokenSecret, visiblePrefix } from "@/features/api/server/token-secret";

/**
 * Dealer admin: makes a token for the active dealership. The secret is returned this once and
 * only its hash is stored, so nobody (not even the admin) can read it back later.
 */
export async function createApiToken(opts: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
  ip?: string | null;
  now?: Date;
}): Promise<{ id: string; name: string; secret: string; expiresAt: string | null }> {
  const { db, actor } = opts;
  // A token may never make tokens: that is for a signed-in dealer admin.
  if (actor.apiToken || !can(actor, "staff:manage"))
    throw new ApiError(403, "forbidden", "Only a dealer admin may make API tokens.");
  const input = parseOrThrow(ZCreateApiTokenInput, opts.input);
  const now = opts.now ?? new Date();
  const secret = newTokenSecret();
  const expiresAt = input.expiresInDays
    ? new Date(now.getTime() + input.expiresInDays * 86_400_000)
    : null;
  const [row] = await db
    .insert(apiTokens)
    .values({
      dealershipId: actor.dealershipId,
      createdById: actor.userId,
      name: input.name,
      scopes: [...new Set(input.scopes)],
      prefix: visiblePrefix(secret),
      secretHash: hashTokenSecret(secret),
      requestsPerMinute: input.requestsPerMinute,
      expiresAt,
    })
    .returning({ id: apiTokens.id });
  await recordAudit(db, {
    kind: "api_token_created",
    dealershipIds: [actor.dealershipId],
    actorUserId: actor.userId,
    subject: input.name,
    detail: { tokenId: row!.id, scopes: input.scopes, expiresAt: expiresAt?.toISOString() ?? null },
    ip: opts.ip ?? null,
  });
  return { id: row!.id, name: input.name, secret, expiresAt: expiresAt?.toISOString() ?? null };
}
