import "server-only";
import { desc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { apiTokens, users } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ApiError } from "@/features/platform";
import type { TApiTokenDto } from "@/features/api/schemas/api-token";

/** Dealer admin: the dealership's tokens, newest first, revoked ones included (never secrets). */
export async function listApiTokens(opts: { db: DbOrTx; actor: TActor }): Promise<TApiTokenDto[]> {
  const { db, actor } = opts;
  if (actor.apiToken || !can(actor, "staff:manage"))
    throw new ApiError(403, "forbidden", "Only a dealer admin may see the API tokens.");
  const rows = await db
    .select({ token: apiTokens, createdBy: users.name, createdByEmail: users.email })
    .from(apiTokens)
    .leftJoin(users, eq(users.id, apiTokens.createdById))
    .where(eq(apiTokens.dealershipId, actor.dealershipId))
    .orderBy(desc(apiTokens.createdAt));
  return rows.map(({ token: t, createdBy, createdByEmail }) => ({
    id: t.id,
    name: t.name,
    scopes: t.scopes,
    prefix: t.prefix,
    requestsPerMinute: t.requestsPerMinute,
    expiresAt: t.expiresAt?.toISOString() ?? null,
    lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
    revokedAt: t.revokedAt?.toISOString() ?? null,
    createdAt: t.createdAt.toISOString(),
    createdBy: createdBy ?? createdByEmail ?? null,
  }));
}
