import { APP_ORIGIN } from "@/tests/support/origin";
import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { NextRequest } from "next/server";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";

// The real SMTP fake on a free port; the app's mailer reads SMTP_PORT on first use.
const smtp = await startSmtpFake({ port: 0 });
process.env.SMTP_PORT = String(smtp.port);
// A small per-IP limit so the IP rule can be reached in a few requests.
process.env.AUTH_LIMIT_PER_IP = "5";

const { getDb, getPool } = await import("@/db/client");
const { auditEvents, capturedMails, users } = await import("@/db/schema");
const { hashPassword } = await import("@/lib/authz/password");
const { GET, POST } = await import("@/app/api/auth/[...nextauth]/route");
const { getActorFromRequest } = await import("@/features/auth/server/get-actor");
const { parseCookieHeader } = await import("@/features/auth/server/session-cookie");
const { createTestMember, requestAs, uniqueTag } = await import("@/tests/support/session");
const { linkFrom, waitForMail } = await import("@/tests/support/mail");

const db = getDb();
const ORIGIN = APP_ORIGIN;

afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

/** Cookies a browser would keep from Set-Cookie headers. */
function jarFrom(res: Response, jar = new Map<string, string>()) {
  for (const line of res.headers.getSetCookie()) {
    const [pair] = line.split(";");
    const eq = pair!.indexOf("=");
    jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
  }
  return jar;
}
const cookieHeader = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

async function csrf(ip: string) {
  const res = await GET(
    new NextRequest(`${ORIGIN}/api/auth/csrf`, { headers: { "x-forwarded-for": ip } }),
  );
  const { csrfToken } = (await res.json()) as { csrfToken: string };
  return { csrfToken, jar: jarFrom(res) };
}

async function postForm(path: string, form: Record<string, string>, ip: string) {
  const { csrfToken, jar } = await csrf(ip);
  const res = await POST(
    new NextRequest(`${ORIGIN}${path}`, {
      method: "POST",
      headers: {
        "content-type": "application/x-www-form-urlencoded",
        cookie: cookieHeader(jar),
        "x-forwarded-for": ip,
      },
      body: new URLSearchParams({ ...form, csrfToken, callbackUrl: "/dashboard" }),
    }),
  );
  return { res, jar: jarFrom(res, jar) };
}

async function memberWithPassword(password: string) {
  const m = await createTestMember({ db, roles: ["estimator"] });
  await db
    .update(users)
    .set({ passwordHash: await hashPassword(password) })
    .where(eq(users.id, m.user.id));
  return m;
}

const uniqueIp = () =>
  `10.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

describe("password sign-in through the Auth.js route handler", () => {
  it("the right password sets a session cookie that resolves to the member", async () => {
    const m = await memberWithPassword("correct horse battery");
    const ip = uniqueIp();
    const { res, jar } = await postForm(
      "/api/auth/callback/credentials",
      { email: m.user.email, password: "correct horse battery" },
      ip,
    );
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe(`${ORIGIN}/dashboard`);
    expect(jar.get("authjs.session-token")).toBeTruthy();
    const actor = await getActorFromRequest(requestAs(cookieHeader(jar), "/api/x"));
    expect(actor?.userId).toBe(m.user.id);
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.dealershipId, m.dealership.id), eq(auditEvents.kind, "sign_in")));
    expect(events).toHaveLength(1);
    expect(events[0]!.ip).toBe(ip);
  });

  it("a wrong password and an unknown address get the same answer, and no session", async () => {
    const m = await memberWithPassword("correct horse battery");
    const wrong = await postForm(
      "/api/auth/callback/credentials",
      { email: m.user.email, password: "not the password" },
      uniqueIp(),
    );
    const unknown = await postForm(
      "/api/auth/callback/credentials",
      { email: `nobody-${uniqueTag()}@example.test`, password: "not the password" },
      uniqueIp(),
    );
    for (const { res, jar } of [wrong, unknown]) {
      expect(res.status).toBe(302);
      expect(jar.has("authjs.session-token")).toBe(false);
    }
    expect(wrong.res.headers.get("location")).toBe(unknown.res.headers.get("location"));
    expect(wrong.res.headers.get("location")).toContain("/sign-in?error=CredentialsSignin");
    const failed = await db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.dealershipId, m.dealership.id), eq(auditEvents.kind, "sign_in_failed")),
      );
    expect(failed).toHaveLength(1);
  });

  it("after 10 attempts for one address, even the right password is refused for a while", async () => {
    const m = await memberWithPassword("correct horse battery");
    for (let i = 0; i < 10; i++) {
      await postForm(
        "/api/auth/callback/credentials",
        { email: m.user.email, password: `bad ${i}` },
        uniqueIp(),
      );
    }
    const { res, jar } = await postForm(
      "/api/auth/callback/credentials",
      { email: m.user.email, password: "correct horse battery" },
      uniqueIp(),
    );
    expect(res.headers.get("location")).toContain("code=rate_limited");
    expect(parseCookieHeader(cookieHeader(jar)).has("authjs.session-token")).toBe(false);
  });
});

describe("successful sign-ins are not counted", () => {
  it("signing in 12 times from one IP and address stays allowed", async () => {
    const m = await memberWithPassword("correct horse battery");
    const ip = uniqueIp();
    for (let i = 0; i < 12; i++) {
      const { jar } = await postForm(
        "/api/auth/callback/credentials",
        { email: m.user.email, password: "correct horse battery" },
        ip,
      );
      expect(jar.has("authjs.session-token"), `sign-in ${i + 1}`).toBe(true);
    }
  });
});

describe("e-mail link sign-in", () => {
  it("a known address gets a one-time link that signs in; an unknown one gets the same page and no mail", async () => {
    const m = await createTestMember({ db, roles: ["customer"] });
    const since = new Date(Date.now() - 1000);
    const known = await postForm(
      "/api/auth/signin/nodemailer",
      { email: m.user.email },
      uniqueIp(),
    );
    const unknownEmail = `ghost-${uniqueTag()}@example.test`;
    const unknown = await postForm(
      "/api/auth/signin/nodemailer",
      { email: unknownEmail },
      uniqueIp(),
    );
    expect(known.res.headers.get("location")).toContain("/api/auth/verify-request");
    expect(unknown.res.headers.get("location")).toBe(known.res.headers.get("location"));

    const mail = await waitForMail({ db, to: m.user.email, since });
    const link = linkFrom(mail, "/api/auth/callback/nodemailer");
    const callback = await GET(new NextRequest(link));
    expect(callback.status).toBe(302);
    const jar = jarFrom(callback);
    const actor = await getActorFromRequest(requestAs(cookieHeader(jar), "/api/x"));
    expect(actor?.userId).toBe(m.user.id);

    // Used once: the same link no longer signs in.
    const again = await GET(new NextRequest(link));
    expect(again.headers.get("location")).toContain("error=Verification");
    expect(jarFrom(again).has("authjs.session-token")).toBe(false);

    const ghostMail = await db
      .select()
      .from(capturedMails)
      .where(eq(capturedMails.to, [unknownEmail]));
    expect(ghostMail).toHaveLength(0);
  });
});

describe("per-IP limit on e-mail links", () => {
  it("after 5 requests from one IP, further requests are refused whatever the address", async () => {
    const ip = uniqueIp();
    const locations: string[] = [];
    for (let i = 0; i < 6; i++) {
      const { res } = await postForm(
        "/api/auth/signin/nodemailer",
        { email: `spray-${i}-${uniqueTag()}@example.test` },
        ip,
      );
      locations.push(res.headers.get("location") ?? "");
    }
    expect(locations.slice(0, 5).every((l) => l.includes("verify-request"))).toBe(true);
    expect(locations[5]).toContain("error=");
    expect(locations[5]).not.toContain("verify-request");
    // Another IP is unaffected.
    const { res } = await postForm(
      "/api/auth/signin/nodemailer",
      { email: `spray-x-${uniqueTag()}@example.test` },
      uniqueIp(),
    );
    expect(res.headers.get("location")).toContain("verify-request");
  });
});
