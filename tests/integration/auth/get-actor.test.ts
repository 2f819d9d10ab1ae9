import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { encode } from "next-auth/jwt";
import { getDb, getPool } from "@/db/client";
import { getEnv } from "@/lib/env";
import { memberships, users } from "@/db/schema";
import { getActorFromRequest } from "@/features/auth/server/get-actor";
import { withActor } from "@/app/api/_lib/with-actor";
import { createTestMember, requestAs } from "@/tests/support/session";

const db = getDb();
afterAll(async () => {
  await getPool().end();
});

describe("getActorFromRequest", () => {
  it("resolves the member, roles and dealership from the database", async () => {
    const m = await createTestMember({ db, roles: ["dealer_admin", "billing_admin"] });
    const actor = await getActorFromRequest(requestAs(m.cookie, "/api/x"));
    expect(actor).toMatchObject({
      userId: m.user.id,
      dealershipId: m.dealership.id,
      customerId: null,
    });
    expect(actor?.roles.sort()).toEqual(["billing_admin", "dealer_admin"]);
  });

  it("accepts the __Secure- cookie name used over https", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    const value = m.cookie.split("=")[1]!;
    // The secure cookie is encrypted with its own name as salt, so re-mint it.
    const secure = await encode({
      token: { sub: m.user.id, email: m.user.email },
      secret: getEnv().AUTH_SECRET,
      salt: "__Secure-authjs.session-token",
    });
    expect(value).not.toBe(secure);
    const actor = await getActorFromRequest(
      requestAs(`__Secure-authjs.session-token=${secure}`, "/api/x"),
    );
    expect(actor?.userId).toBe(m.user.id);
  });

  it("returns null with no cookie, a tampered cookie, or a token for another salt", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    expect(await getActorFromRequest(requestAs(null, "/api/x"))).toBeNull();
    expect(await getActorFromRequest(requestAs(`${m.cookie}x`, "/api/x"))).toBeNull();
    const wrongSalt = m.cookie.replace("authjs.session-token=", "__Secure-authjs.session-token=");
    expect(await getActorFromRequest(requestAs(wrongSalt, "/api/x"))).toBeNull();
  });

  it("an expired session token is refused", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    const expired = await encode({
      token: { sub: m.user.id, email: m.user.email },
      secret: getEnv().AUTH_SECRET,
      salt: "authjs.session-token",
      maxAge: -60,
    });
    expect(
      await getActorFromRequest(requestAs(`authjs.session-token=${expired}`, "/api/x")),
    ).toBeNull();
  });

  it("a removed member loses access at once, although the token is still valid", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    expect(await getActorFromRequest(requestAs(m.cookie, "/api/x"))).not.toBeNull();
    await db
      .delete(memberships)
      .where(and(eq(memberships.userId, m.user.id), eq(memberships.dealershipId, m.dealership.id)));
    expect(await getActorFromRequest(requestAs(m.cookie, "/api/x"))).toBeNull();
  });

  it("a role change takes effect without a new token", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    await db
      .update(memberships)
      .set({ role: "billing_admin" })
      .where(eq(memberships.userId, m.user.id));
    const actor = await getActorFromRequest(requestAs(m.cookie, "/api/x"));
    expect(actor?.roles).toEqual(["billing_admin"]);
  });

  it("sessions issued before a password reset are refused", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    await db
      .update(users)
      .set({ sessionsValidFrom: new Date(Date.now() + 5_000) })
      .where(eq(users.id, m.user.id));
    expect(await getActorFromRequest(requestAs(m.cookie, "/api/x"))).toBeNull();
  });

  it("a customer account carries its customer record", async () => {
    const m = await createTestMember({ db, roles: ["customer"] });
    const actor = await getActorFromRequest(requestAs(m.cookie, "/api/x"));
    expect(actor?.customerId).toBe(m.actor.customerId);
    expect(actor?.customerId).toBeTruthy();
  });
});

describe("withActor", () => {
  const handler = withActor(async ({ actor, params }) =>
    Response.json({ userId: actor.userId, params }),
  );

  it("answers 401 JSON with no session", async () => {
    const res = await handler(requestAs(null, "/api/x"), { params: Promise.resolve({}) });
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ error: { code: "unauthenticated" } });
  });

  it("passes the actor and flattened params to the handler", async () => {
    const m = await createTestMember({ db, roles: ["estimator"] });
    const res = await handler(requestAs(m.cookie, "/api/x"), {
      params: Promise.resolve({ id: "abc", rest: ["a", "b"] }),
    });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ userId: m.user.id, params: { id: "abc", rest: "a/b" } });
  });
});
