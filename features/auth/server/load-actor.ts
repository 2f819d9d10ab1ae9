import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dealerships, memberships, users } from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";
import type { TSessionClaims } from "@/features/auth/server/session-cookie";

/** The user with each membership, oldest first, in one round trip (no membership: one row of nulls). */
function actorRows(db: DbOrTx) {
  return db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      unitSystem: users.unitSystem,
      activeDealershipId: users.activeDealershipId,
      sessionsValidFrom: users.sessionsValidFrom,
      dealershipId: memberships.dealershipId,
      role: memberships.role,
      customerId: memberships.customerId,
      currency: dealerships.currency,
    })
    .from(users)
    .leftJoin(memberships, eq(memberships.userId, users.id))
    .leftJoin(dealerships, eq(dealerships.id, memberships.dealershipId))
    .where(eq(users.id, sql.placeholder("userId")))
    .orderBy(asc(memberships.createdAt), asc(memberships.id));
}

// Prepared once per database handle: skips building the SQL in JS and planning it in Postgres.
const prepared = new WeakMap<object, ReturnType<ReturnType<typeof actorRows>["prepare"]>>();

/**
 * Builds the actor from the database for a decoded session. Roles and the active dealership
 * always come from the database, so a removed member or a changed role takes effect at once.
 */
export async function loadActor(db: DbOrTx, claims: TSessionClaims): Promise<TActor | null> {
  let statement = prepared.get(db);
  if (!statement) {
    statement = actorRows(db).prepare("load_actor");
    prepared.set(db, statement);
  }
  const rows = await statement.execute({ userId: claims.userId });
  const user = rows[0];
  if (!user) return null;
  // A password reset signs out every session issued before it.
  if (user.sessionsValidFrom && claims.issuedAt !== null) {
    if (claims.issuedAt < Math.floor(user.sessionsValidFrom.getTime() / 1000)) return null;
  }
  const member = rows.filter((m) => m.dealershipId !== null && m.role !== null);
  if (member.length === 0) return null;
  const activeId = member.some((m) => m.dealershipId === user.activeDealershipId)
    ? user.activeDealershipId!
    : member[0]!.dealershipId!;
  const inActive = member.filter((m) => m.dealershipId === activeId);
  const customerRow = inActive.find((m) => m.role === "customer");
  return {
    userId: user.id,
    email: user.email,
    name: user.name,
    dealershipId: activeId,
    roles: [...new Set(inActive.map((m) => m.role as TRole))],
    customerId: customerRow?.customerId ?? null,
    unitSystem: user.unitSystem,
    currency: inActive[0]?.currency ?? "EUR",
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
