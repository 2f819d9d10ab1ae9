import "server-only";
import { and, eq, gt, isNull, TransactionRollbackError } from "drizzle-orm";
import type { Db } from "@/db/client";
import { dealerships, invitations, memberships, users, type TMembershipRole } from "@/db/schema";
import { hashPassword } from "@/lib/authz/password";
import { recordAudit } from "@/features/auth/server/audit";
import { hashLinkToken } from "@/features/auth/server/tokens";

export type TInvitationView = {
  status: "valid" | "expired" | "used" | "revoked";
  email: string;
  role: TMembershipRole;
  dealershipName: string;
  /** An account with this address exists (and has a password): accepting needs no new one. */
  hasAccount: boolean;
};

/** What the invitation page shows for a link, or null when the token matches nothing. */
export async function viewInvitation(db: Db, token: string): Promise<TInvitationView | null> {
  const [row] = await db
    .select({ inv: invitations, dealershipName: dealerships.name })
    .from(invitations)
    .innerJoin(dealerships, eq(dealerships.id, invitations.dealershipId))
    .where(eq(invitations.tokenHash, hashLinkToken(token)));
  if (!row) return null;
  const { inv } = row;
  const [user] = await db
    .select({ passwordHash: users.passwordHash })
    .from(users)
    .where(eq(users.email, inv.email));
  const status = inv.revokedAt
    ? "revoked"
    : inv.acceptedAt
      ? "used"
      : inv.expiresAt <= new Date()
        ? "expired"
        : "valid";
  return {
    status,
    email: inv.email,
    role: inv.role,
    dealershipName: row.dealershipName,
    hasAccount: Boolean(user?.passwordHash),
  };
}

export type TAcceptResult =
  | { ok: true; email: string; userId: string; createdAccount: boolean }
  | { ok: false; reason: "invalid" | "password_required" };

/**
 * Accepts an invitation: claims it (single use, not expired, not revoked) and adds the
 * membership, creating the account with the given password when the address has none. All in
 * one transaction, so a failure leaves the invitation usable.
 */
export async function acceptInvitation(opts: {
  db: Db;
  token: string;
  name: string;
  /** Required when the address has no account with a password yet. */
  password?: string | null;
  ip?: string | null;
}): Promise<TAcceptResult> {
  const passwordHash = opts.password ? await hashPassword(opts.password) : null;
  return opts.db
    .transaction(async (tx) => {
      const [inv] = await tx
        .update(invitations)
        .set({ acceptedAt: new Date() })
        .where(
          and(
            eq(invitations.tokenHash, hashLinkToken(opts.token)),
            isNull(invitations.acceptedAt),
            isNull(invitations.revokedAt),
            gt(invitations.expiresAt, new Date()),
          ),
        )
        .returning();
      if (!inv) return { ok: false as const, reason: "invalid" as const };
      let [user] = await tx.select().from(users).where(eq(users.email, inv.email));
      const createdAccount = !user;
      // Undo the claim: the person must choose a password first.
      if (!user?.passwordHash && !passwordHash) tx.rollback();
      if (!user) {
        [user] = await tx
          .insert(users)
          .values({
            email: inv.email,
            name: opts.name,
            passwordHash,
            emailVerified: new Date(),
            activeDealershipId: inv.dealershipId,
          })
          .returning();
      } else {
        // The link proves the address; switch the person to the dealership they just joined.
        await tx
          .update(users)
          .set({
            activeDealershipId: inv.dealershipId,
            emailVerified: user.emailVerified ?? new Date(),
            ...(user.passwordHash ? {} : { passwordHash }),
          })
          .where(eq(users.id, user.id));
      }
      await tx
        .insert(memberships)
        .values({
          dealershipId: inv.dealershipId,
          userId: user!.id,
          role: inv.role,
          customerId: inv.role === "customer" ? inv.customerId : null,
        })
        .onConflictDoNothing();
      await recordAudit(tx, {
        kind: "invitation_accepted",
        dealershipIds: [inv.dealershipId],
        actorUserId: user!.id,
        subject: inv.email,
        detail: { role: inv.role },
        ip: opts.ip,
      });
      return { ok: true as const, email: inv.email, userId: user!.id, createdAccount };
    })
    .catch((error: unknown) => {
      if (error instanceof TransactionRollbackError) {
        return { ok: false as const, reason: "password_required" as const };
      }
      throw error;
    });
}
