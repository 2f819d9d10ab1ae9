import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { passwordResetTokens, users } from "@/db/schema";
import { hashPassword } from "@/lib/authz/password";
import { recordAudit } from "@/features/auth/server/audit";
import { dealershipIdsOf } from "@/features/auth/server/dealership-ids-of";
import type { TMailer } from "@/features/auth/server/mailer";
import { passwordResetMail } from "@/features/auth/server/mail-templates";
import { checkSignInLimits } from "@/features/auth/server/sign-in-limits";
import { hashLinkToken, newLinkToken } from "@/features/auth/server/tokens";

const RESET_TTL_MS = 30 * 60 * 1000;

/** Sends a reset link when the address has an account; says nothing either way. */
export async function requestPasswordReset(opts: {
  db: Db;
  mailer: TMailer;
  email: string;
  ip: string;
  appUrl: string;
}): Promise<{ allowed: boolean }> {
  const { db, email } = opts;
  const limit = await checkSignInLimits(db, { kind: "password-reset", email, ip: opts.ip });
  if (!limit.allowed) return { allowed: false };
  const [user] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  if (!user) return { allowed: true };
  const { token, hash } = newLinkToken();
  await db.insert(passwordResetTokens).values({
    tokenHash: hash,
    userId: user.id,
    expiresAt: new Date(Date.now() + RESET_TTL_MS),
  });
  await recordAudit(db, {
    kind: "password_reset_requested",
    dealershipIds: await dealershipIdsOf(db, user.id),
    actorUserId: user.id,
    subject: email,
    ip: opts.ip,
  });
  await opts.mailer.send(passwordResetMail(email, `${opts.appUrl}/reset-password/${token}`));
  return { allowed: true };
}

/** Whether a reset link can still be used (for the page, before the form is shown). */
export async function isResetTokenUsable(db: Db, token: string): Promise<boolean> {
  const [row] = await db
    .select({ userId: passwordResetTokens.userId })
    .from(passwordResetTokens)
    .where(
      and(
        eq(passwordResetTokens.tokenHash, hashLinkToken(token)),
        isNull(passwordResetTokens.usedAt),
        gt(passwordResetTokens.expiresAt, new Date()),
      ),
    );
  return Boolean(row);
}

/**
 * Sets a new password from a reset link. Single use: the token is claimed atomically. Every
 * session issued before now stops working.
 */
export async function resetPassword(opts: {
  db: Db;
  token: string;
  newPassword: string;
}): Promise<{ ok: true; email: string } | { ok: false }> {
  const passwordHash = await hashPassword(opts.newPassword);
  return opts.db.transaction(async (tx) => {
    const [claimed] = await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(
        and(
          eq(passwordResetTokens.tokenHash, hashLinkToken(opts.token)),
          isNull(passwordResetTokens.usedAt),
          gt(passwordResetTokens.expiresAt, new Date()),
        ),
      )
      .returning({ userId: passwordResetTokens.userId });
    if (!claimed) return { ok: false as const };
    const [user] = await tx
      .update(users)
      .set({ passwordHash, sessionsValidFrom: new Date(), emailVerified: new Date() })
      .where(eq(users.id, claimed.userId))
      .returning();
    const dealershipIds = await dealershipIdsOf(tx, claimed.userId);
    await recordAudit(tx, {
      kind: "password_reset",
      dealershipIds,
      actorUserId: claimed.userId,
      subject: user!.email,
    });
    return { ok: true as const, email: user!.email };
  });
}
