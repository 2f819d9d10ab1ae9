import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { memberships, users } from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";
import type { TSessionClaims } from "@/features/auth/server/session-cookie";

/**
 * Builds the actor from the database for a decoded session. Roles and the active dealership
 * always come from the database, so a removed member or a changed role takes effect at once.
 */
export async function loadActor(db: DbOrTx, claims: TSessionClaims): Promise<TActor | null> {
  const [user] = await db.select().from(users).where(eq(users.id, claims.userId)).limit(1);
  if (!user) return null;
  // A password reset signs out every session issued before it.
  if (user.sessionsValidFrom && claims.issuedAt !== null) {
    if (claims.issuedAt < Math.floor(user.sessionsValidFrom.getTime() / 1000)) return null;
  }
  const rows = await db
    .select()
    .from(memberships)
    .where(eq(memberships.userId, user.id))
    .orderBy(asc(memberships.createdAt));
  if (rows.length === 0) return null;
  const activeId = rows.some((m) => m.dealershipId === user.activeDealershipId)
    ? user.activeDealershipId
    : rows[0]!.dealershipId;
  const inActive = rows.filter((m) => m.dealershipId === activeId);
  const customerRow = inActive.find((m) => m.role === "customer");
  return {
    userId: user.id,
    email: user.email,
    name: user.name,
    dealershipId: activeId!,
    roles: [...new Set(inActive.map((m) => m.role as TRole))],
    customerId: customerRow?.customerId ?? null,
    unitSystem: user.unitSystem,
  };
}

/** Whether a user belongs to a dealership (checked before switching to it). */
export async function hasMembership(db: DbOrTx, userId: string, dealershipId: string) {
  const [row] = await db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.dealershipId, dealershipId)))
    .limit(1);
  return Boolean(row);
}
