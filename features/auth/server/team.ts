import "server-only";
import { and, asc, desc, eq, gt, inArray, isNull } from "drizzle-orm";
import type { Db, DbOrTx } from "@/db/client";
import { customers, invitations, memberships, users, type TMembershipRole } from "@/db/schema";
import type { TActor, TRole } from "@/lib/authz/actor";
import { can, ROLE_LABELS } from "@/lib/authz/policy";
import type { TActionState } from "@/features/auth/server/action-state";
import { recordAudit } from "@/features/auth/server/audit";

const STAFF_ONLY: TActionState = {
  ok: false,
  code: "forbidden",
  message: "Only a dealer admin can manage the team.",
};

export type TMemberRow = {
  userId: string;
  name: string | null;
  email: string;
  roles: TMembershipRole[];
  customerName: string | null;
};

/** Everyone in the actor's active dealership, with their roles. */
export async function listMembers(db: Db, actor: TActor): Promise<TMemberRow[] | null> {
  if (!can(actor, "staff:manage")) return null;
  const rows = await db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      customerName: customers.name,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .leftJoin(customers, eq(customers.id, memberships.customerId))
    .where(eq(memberships.dealershipId, actor.dealershipId))
    .orderBy(asc(users.name), asc(users.email));
  const byUser = new Map<string, TMemberRow>();
  for (const r of rows) {
    const row = byUser.get(r.userId) ?? { ...r, roles: [], customerName: null };
    row.roles.push(r.role);
    row.customerName ??= r.customerName;
    byUser.set(r.userId, row);
  }
  return [...byUser.values()];
}

/** Invitations not yet accepted, revoked or expired. */
export async function listPendingInvitations(db: Db, actor: TActor) {
  if (!can(actor, "staff:manage")) return null;
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      customerName: customers.name,
    })
    .from(invitations)
    .leftJoin(customers, eq(customers.id, invitations.customerId))
    .where(
      and(
        eq(invitations.dealershipId, actor.dealershipId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, new Date()),
      ),
    )
    .orderBy(desc(invitations.createdAt));
}

/** The dealership's customers, for choosing whom a customer account belongs to. */
export async function listInvitableCustomers(db: Db, actor: TActor) {
  if (!can(actor, "staff:manage")) return null;
  return db
    .select({ id: customers.id, name: customers.name })
    .from(customers)
    .where(eq(customers.dealershipId, actor.dealershipId))
    .orderBy(asc(customers.name));
}

export async function revokeInvitation(opts: {
  db: Db;
  actor: TActor;
  invitationId: string;
}): Promise<TActionState> {
  const { db, actor } = opts;
  if (!can(actor, "staff:manage")) return STAFF_ONLY;
  const [row] = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(invitations.id, opts.invitationId),
        eq(invitations.dealershipId, actor.dealershipId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ email: invitations.email, role: invitations.role });
  if (!row)
    return { ok: false, code: "not_found", message: "That invitation is no longer pending." };
  await recordAudit(db, {
    kind: "invitation_revoked",
    dealershipIds: [actor.dealershipId],
    actorUserId: actor.userId,
    subject: row.email,
    detail: { role: row.role },
  });
  return { ok: true, message: `Invitation to ${row.email} revoked.` };
}

/** Locks the dealership's memberships so two admins cannot demote each other at once. */
async function lockMemberships(tx: DbOrTx, dealershipId: string) {
  return tx
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(eq(memberships.dealershipId, dealershipId))
    .for("update");
}

function adminsAfter(
  rows: { userId: string; role: TMembershipRole }[],
  userId: string,
  newRoles: TRole[],
): number {
  const others = rows.filter((r) => r.role === "dealer_admin" && r.userId !== userId).length;
  return others + (newRoles.includes("dealer_admin") ? 1 : 0);
}

const LAST_ADMIN: TActionState = {
  ok: false,
  code: "conflict",
  message: "A dealership needs at least one dealer admin. Make someone else dealer admin first.",
};

/** Replaces a staff member's roles in the active dealership. */
export async function setMemberRoles(opts: {
  db: Db;
  actor: TActor;
  userId: string;
  roles: Exclude<TRole, "customer">[];
}): Promise<TActionState> {
  const { db, actor } = opts;
  if (!can(actor, "staff:manage")) return STAFF_ONLY;
  const roles = [...new Set(opts.roles)];
  return db.transaction(async (tx) => {
    const rows = await lockMemberships(tx, actor.dealershipId);
    const current = rows.filter((r) => r.userId === opts.userId).map((r) => r.role);
    if (current.length === 0) return { ok: false, code: "not_found", message: "No such member." };
    if (current.includes("customer")) {
      return {
        ok: false,
        code: "conflict",
        message: "A customer account keeps its customer role. Remove it and invite again instead.",
      };
    }
    if (adminsAfter(rows, opts.userId, roles) === 0) return LAST_ADMIN;
    const toRemove = current.filter((r) => !(roles as TRole[]).includes(r));
    const toAdd = roles.filter((r) => !current.includes(r));
    if (toRemove.length) {
      await tx
        .delete(memberships)
        .where(
          and(
            eq(memberships.dealershipId, actor.dealershipId),
            eq(memberships.userId, opts.userId),
            inArray(memberships.role, toRemove),
          ),
        );
    }
    for (const role of toAdd) {
      await tx
        .insert(memberships)
        .values({ dealershipId: actor.dealershipId, userId: opts.userId, role });
    }
    const [user] = await tx
      .select({ email: users.email })
      .from(users)
      .where(eq(users.id, opts.userId));
    await recordAudit(tx, {
      kind: "role_changed",
      dealershipIds: [actor.dealershipId],
      actorUserId: actor.userId,
      subject: user?.email,
      detail: { from: current, to: roles },
    });
    return {
      ok: true,
      message: `Roles set: ${roles.map((r) => ROLE_LABELS[r]).join(", ")}.`,
    };
  });
}

/** Removes someone from the active dealership (their account stays for other dealerships). */
export async function removeMember(opts: {
  db: Db;
  actor: TActor;
  userId: string;
}): Promise<TActionState> {
  const { db, actor } = opts;
  if (!can(actor, "staff:manage")) return STAFF_ONLY;
  return db.transaction(async (tx) => {
    const rows = await lockMemberships(tx, actor.dealershipId);
    const current = rows.filter((r) => r.userId === opts.userId).map((r) => r.role);
    if (current.length === 0) return { ok: false, code: "not_found", message: "No such member." };
    if (adminsAfter(rows, opts.userId, []) === 0) {
      return opts.userId === actor.userId
        ? {
            ok: false,
            code: "conflict",
            message:
              "You are the last dealer admin. Make someone else dealer admin before you leave.",
          }
        : LAST_ADMIN;
    }
    await tx
      .delete(memberships)
      .where(
        and(eq(memberships.dealershipId, actor.dealershipId), eq(memberships.userId, opts.userId)),
      );
    // If this was their active dealership, the next request falls back to another membership.
    await tx
      .update(users)
      .set({ activeDealershipId: null })
      .where(and(eq(users.id, opts.userId), eq(users.activeDealershipId, actor.dealershipId)));
    const [user] = await tx
      .select({ email: users.email })
      .from(users)
      .where(eq(users.id, opts.userId));
    await recordAudit(tx, {
      kind: "member_removed",
      dealershipIds: [actor.dealershipId],
      actorUserId: actor.userId,
      subject: user?.email,
      detail: { roles: current },
    });
    return { ok: true, message: `${user?.email ?? "Member"} removed.` };
  });
}
