import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import { auditEvents, customers, invitations, memberships, users } from "@/db/schema";
import { acceptInvitation, viewInvitation } from "@/features/auth/server/accept-invitation";
import { inviteMember } from "@/features/auth/server/invite-member";
import { createMailer, type TMailer } from "@/features/auth/server/mailer";
import { getActorFromRequest } from "@/features/auth/server/get-actor";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { createTestMember, requestAs, sessionCookieFor, uniqueTag } from "@/tests/support/session";

const db = getDb();
const APP = "http://localhost:3000";
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;
let mailer: TMailer;

beforeAll(async () => {
  // The real SMTP fake on a free port, storing into PostgreSQL, behind the real nodemailer transport.
  smtp = await startSmtpFake({ port: 0 });
  mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Treadcast <t@example.test>" });
});
afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

function tokenOf(url: string): string {
  return new URL(url).pathname.split("/").pop()!;
}

describe("invitations", () => {
  it("a dealer admin invites a customer; the link creates the account tied to that customer", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const [customer] = await db
      .insert(customers)
      .values({ dealershipId: admin.dealership.id, name: `Invited Farm ${uniqueTag()}` })
      .returning();
    const email = `cust-${uniqueTag()}@example.test`;
    const since = new Date(Date.now() - 1000);
    const sent = await inviteMember({
      db,
      mailer,
      actor: admin.actor,
      input: { email, role: "customer", customerId: customer!.id },
      appUrl: APP,
    });
    expect(sent.ok).toBe(true);
    const mail = await waitForMail({ db, to: email, since });
    expect(mail.subject).toContain(admin.dealership.name);
    const token = tokenOf(linkFrom(mail, "/invite/"));

    const view = await viewInvitation(db, token);
    expect(view).toMatchObject({ status: "valid", role: "customer", hasAccount: false, email });

    const noPassword = await acceptInvitation({ db, token, name: "New Person" });
    expect(noPassword).toEqual({ ok: false, reason: "password_required" });
    // The failed attempt did not use up the link.
    expect((await viewInvitation(db, token))?.status).toBe("valid");

    const accepted = await acceptInvitation({
      db,
      token,
      name: "New Person",
      password: "a long enough password",
    });
    expect(accepted).toMatchObject({ ok: true, email, createdAccount: true });
    const [user] = await db.select().from(users).where(eq(users.email, email));
    const cookie = await sessionCookieFor(user!);
    const actor = await getActorFromRequest(requestAs(cookie, "/api/x"));
    expect(actor).toMatchObject({
      dealershipId: admin.dealership.id,
      roles: ["customer"],
      customerId: customer!.id,
    });

    // Single use.
    expect(
      await acceptInvitation({ db, token, name: "Again", password: "another password!" }),
    ).toEqual({ ok: false, reason: "invalid" });
    expect((await viewInvitation(db, token))?.status).toBe("used");
    const audit = await db
      .select({ kind: auditEvents.kind })
      .from(auditEvents)
      .where(eq(auditEvents.dealershipId, admin.dealership.id));
    expect(audit.map((a) => a.kind)).toEqual(
      expect.arrayContaining(["invitation_sent", "invitation_accepted"]),
    );
  });

  it("an expired invitation cannot be accepted", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const email = `late-${uniqueTag()}@example.test`;
    const since = new Date(Date.now() - 1000);
    await inviteMember({
      db,
      mailer,
      actor: admin.actor,
      input: { email, role: "estimator" },
      appUrl: APP,
    });
    const token = tokenOf(linkFrom(await waitForMail({ db, to: email, since }), "/invite/"));
    await db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.email, email));
    expect((await viewInvitation(db, token))?.status).toBe("expired");
    expect(
      await acceptInvitation({ db, token, name: "Late", password: "a long enough password" }),
    ).toEqual({ ok: false, reason: "invalid" });
  });

  it("an existing user joins a second dealership without a new password", async () => {
    const other = await createTestMember({ db, roles: ["estimator"] });
    await db
      .update(users)
      .set({ passwordHash: "scrypt$1$1$1$x$y" })
      .where(eq(users.id, other.user.id));
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const since = new Date(Date.now() - 1000);
    await inviteMember({
      db,
      mailer,
      actor: admin.actor,
      input: { email: other.user.email, role: "billing_admin" },
      appUrl: APP,
    });
    const token = tokenOf(
      linkFrom(await waitForMail({ db, to: other.user.email, since }), "/invite/"),
    );
    expect((await viewInvitation(db, token))?.hasAccount).toBe(true);
    const res = await acceptInvitation({ db, token, name: "Ignored" });
    expect(res).toMatchObject({ ok: true, createdAccount: false });
    // The new dealership is now active; the old membership remains.
    const actor = await getActorFromRequest(requestAs(other.cookie, "/api/x"));
    expect(actor).toMatchObject({ dealershipId: admin.dealership.id, roles: ["billing_admin"] });
    const rows = await db.select().from(memberships).where(eq(memberships.userId, other.user.id));
    expect(rows).toHaveLength(2);
  });

  it("only a dealer admin may invite, and a customer record must be the dealership's own", async () => {
    for (const role of ["estimator", "billing_admin", "customer"] as const) {
      const m = await createTestMember({ db, roles: [role] });
      const res = await inviteMember({
        db,
        mailer,
        actor: m.actor,
        input: { email: `x-${uniqueTag()}@example.test`, role: "estimator" },
        appUrl: APP,
      });
      expect(res).toMatchObject({ ok: false, code: "forbidden" });
    }
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const foreign = await createTestMember({ db, roles: ["customer"] });
    const res = await inviteMember({
      db,
      mailer,
      actor: admin.actor,
      input: {
        email: `y-${uniqueTag()}@example.test`,
        role: "customer",
        customerId: foreign.actor.customerId,
      },
      appUrl: APP,
    });
    expect(res).toMatchObject({ ok: false, code: "invalid_input" });
    const stored = await db
      .select()
      .from(invitations)
      .where(and(eq(invitations.dealershipId, admin.dealership.id)));
    expect(stored).toHaveLength(0);
  });

  it("a failed mail send leaves no invitation behind", async () => {
    const admin = await createTestMember({ db, roles: ["dealer_admin"] });
    const deadMailer = createMailer({ host: "127.0.0.1", port: 1, from: "t@example.test" });
    await expect(
      inviteMember({
        db,
        mailer: deadMailer,
        actor: admin.actor,
        input: { email: `z-${uniqueTag()}@example.test`, role: "estimator" },
        appUrl: APP,
      }),
    ).rejects.toThrow();
    const stored = await db
      .select()
      .from(invitations)
      .where(eq(invitations.dealershipId, admin.dealership.id));
    expect(stored).toHaveLength(0);
  });
});
