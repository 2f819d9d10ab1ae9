import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import { users } from "@/db/schema";
import { verifyPassword } from "@/lib/authz/password";
import { getActorFromRequest } from "@/features/auth/server/get-actor";
import { createMailer, type TMailer } from "@/features/auth/server/mailer";
import {
  isResetTokenUsable,
  requestPasswordReset,
  resetPassword,
} from "@/features/auth/server/password-reset";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { createTestMember, requestAs, sessionCookieFor, uniqueTag } from "@/tests/support/session";

const db = getDb();
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;
let mailer: TMailer;
beforeAll(async () => {
  smtp = await startSmtpFake({ port: 0 });
  mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "t@example.test" });
});
afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

describe("password reset by e-mailed link", () => {
  it("sets the new password once and signs out older sessions", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    const since = new Date(Date.now() - 1000);
    const ip = `192.0.2.${Math.floor(Math.random() * 250)}`;
    expect(
      await requestPasswordReset({
        db,
        mailer,
        email: m.user.email,
        ip,
        appUrl: "http://localhost:3000",
      }),
    ).toEqual({ allowed: true });
    const link = linkFrom(await waitForMail({ db, to: m.user.email, since }), "/reset-password/");
    const token = new URL(link).pathname.split("/").pop()!;
    expect(await isResetTokenUsable(db, token)).toBe(true);

    // Sessions minted before the reset; wait past the second boundary of the JWT's iat.
    await new Promise((r) => setTimeout(r, 1100));
    expect(await resetPassword({ db, token, newPassword: "a brand new password" })).toMatchObject({
      ok: true,
    });
    const [user] = await db.select().from(users).where(eq(users.id, m.user.id));
    expect(await verifyPassword("a brand new password", user!.passwordHash)).toBe(true);
    expect(await getActorFromRequest(requestAs(m.cookie, "/x"))).toBeNull();
    await new Promise((r) => setTimeout(r, 1100));
    const fresh = await sessionCookieFor(m.user);
    expect(await getActorFromRequest(requestAs(fresh, "/x"))).not.toBeNull();

    expect(await resetPassword({ db, token, newPassword: "yet another password" })).toEqual({
      ok: false,
    });
    expect(await isResetTokenUsable(db, token)).toBe(false);
  });

  it("an unknown address gets the same answer and no mail", async () => {
    const email = `nobody-${uniqueTag()}@example.test`;
    expect(
      await requestPasswordReset({
        db,
        mailer,
        email,
        ip: "192.0.2.9",
        appUrl: "http://localhost:3000",
      }),
    ).toEqual({ allowed: true });
    await expect(waitForMail({ db, to: email, timeoutMs: 500 })).rejects.toThrow(/no mail/);
  });
});
