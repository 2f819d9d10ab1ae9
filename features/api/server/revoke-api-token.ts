import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { recordAudit } from "@/features/auth";
import { ApiError } from "@/features/platform";

/** Dealer admin: stops a token at once. Revoking twice is harmless; another dealership's is 404. */
export async function revokeApiToken(opts: {
  db: DbOrTx;
  actor: TActor;
  tokenId: string;
  ip?: string | null;
}): Promise<{ id: string; revokedAt: string }> {
  const { db, actor, tokenId } = opts;
  if (actor.apiToken || !can(actor, "staff:manage"))
    throw new ApiError(403, "forbidden", "Only a dealer admin may revoke API tokens.");
  const [existing] = await db
    .select()
    .from(apiTokens)
    .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.dealershipId, actor.dealershipId)));
  if (!existing)
    throw new ApiError(404, "not_found", "No API token with that id in your workspace.");
  if (existing.revokedAt) return { id: existing.id, revokedAt: existing.revokedAt.toISOString() };
  const [row] = await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, tokenId), isNull(apiTokens.revokedAt)))
    .returning({ revokedAt: apiTokens.revokedAt });
  await recordAudit(db, {
    kind: "api_token_revoked",
    dealershipIds: [actor.dealershipId],
    actorUserId: actor.userId,
    subject: existing.name,
    detail: { tokenId },
    ip: opts.ip ?? null,
  });
  return { id: tokenId, revokedAt: (row?.revokedAt ?? new Date()).toISOString() };
}
