// API tokens against the real route handlers and PostgreSQL: scopes, revocation, expiry, the
// per-token rate limit, audit lines and idempotency keys.
import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as listCustomers, POST as createCustomer } from "@/app/api/v1/customers/route";
import { GET as getCustomer } from "@/app/api/v1/customers/[id]/route";
import { GET as listReports } from "@/app/api/v1/reports/route";
import { apiTokens, auditEvents, customers, memberships } from "@/db/schema";
import { createApiToken } from "@/features/api/server/create-api-token";
import { listApiTokens } from "@/features/api/server/list-api-tokens";
import { revokeApiToken } from "@/features/api/server/revoke-api-token";
import { hashTokenSecret } from "@/features/api/server/token-secret";
import { makeApiToken } from "@/tests/support/api-tokens";
import { BASE, db, makeDealership } from "@/tests/support/records";
import { createTestMember } from "@/tests/support/session";

type THandler = (
  req: Request,
  ctx: { params: Promise<Record<string, string>> },
) => Promise<Response>;

/** A request the way an integration sends it: a bearer token and no cookie. */
async function bearer(
  handler: THandler,
  authorization: string,
  path: string,
  init: {
    method?: string;
    body?: unknown;
    params?: Record<string, string>;
    headers?: Record<string, string>;
  } = {},
) {
  const headers: Record<string, string> = { authorization, ...(init.headers ?? {}) };
  if (init.body !== undefined) headers["content-type"] = "application/json";
  const res = await handler(
    new Request(`${BASE}${path}`, {
      method: init.method ?? "GET",
      headers,
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    }),
    { params: Promise.resolve(init.params ?? {}) },
  );
  const text = await res.text();
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  let body: any = text;
  try {
    body = JSON.parse(text);
  } catch {
    // not JSON
  }
  return { status: res.status, body, headers: res.headers };
}

let team: Awaited<ReturnType<typeof makeDealership>>;
let rival: Awaited<ReturnType<typeof makeDealership>>;
beforeAll(async () => {
  team = await makeDealership();
  rival = await makeDealership();
});

describe("API tokens", () => {
  it("stores only a SHA-256 of the secret, shows the secret once, and lists without it", async () => {
    const made = await createApiToken({
      db,
      actor: team.admin.actor,
      input: { name: "Workshop export", scopes: ["read"] },
    });
    expect(made.secret).toMatch(/^tcapi_[A-Za-z0-9_-]{43}$/);
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, made.id));
    expect(row!.secretHash).toBe(hashTokenSecret(made.secret));
    expect(JSON.stringify(row)).not.toContain(made.secret);
    const listed = await listApiTokens({ db, actor: team.admin.actor });
    expect(listed.find((t) => t.id === made.id)).toMatchObject({
      name: "Workshop export",
      scopes: ["read"],
      revokedAt: null,
    });
    expect(JSON.stringify(listed)).not.toContain(made.secret);
    const audit = await db
      .select()
      .from(auditEvents)
      .where(
        and(
          eq(auditEvents.dealershipId, team.dealershipId),
          eq(auditEvents.kind, "api_token_created"),
        ),
      );
    expect(audit.some((a) => a.subject === "Workshop export")).toBe(true);
  });

  it("only a signed-in dealer admin may make, list or revoke tokens", async () => {
    await expect(
      createApiToken({ db, actor: team.estimator.actor, input: { name: "x", scopes: ["read"] } }),
    ).rejects.toMatchObject({ status: 403 });
    await expect(listApiTokens({ db, actor: team.billing.actor })).rejects.toMatchObject({
      status: 403,
    });
    const own = await makeApiToken(db, team.admin.actor, ["read"]);
    // Another dealership's admin cannot even find it.
    await expect(
      revokeApiToken({ db, actor: rival.admin.actor, tokenId: own.id }),
    ).rejects.toMatchObject({ status: 404 });
    // A token (even one made by an admin) never makes tokens.
    const asToken = {
      ...team.admin.actor,
      apiToken: { id: own.id, name: "t", grants: new Set<never>() },
    };
    await expect(
      createApiToken({ db, actor: asToken, input: { name: "y", scopes: ["read"] } }),
    ).rejects.toMatchObject({ status: 403 });
  });

  it("a read token reads its own dealership only and cannot write", async () => {
    const token = await makeApiToken(db, team.admin.actor, ["read"]);
    const [mine] = await db
      .insert(customers)
      .values({ dealershipId: team.dealershipId, name: "Token Read Farm" })
      .returning();
    const [theirs] = await db
      .insert(customers)
      .values({ dealershipId: rival.dealershipId, name: "Rival Secret Farm" })
      .returning();
    const list = await bearer(listCustomers, token.authorization, "/api/v1/customers?pageSize=100");
    expect(list.status).toBe(200);
    expect(JSON.stringify(list.body)).toContain("Token Read Farm");
    expect(JSON.stringify(list.body)).not.toContain("Rival Secret Farm");
    const other = await bearer(
      getCustomer,
      token.authorization,
      `/api/v1/customers/${theirs!.id}`,
      {
        params: { id: theirs!.id },
      },
    );
    expect(other.status).toBe(404);
    const write = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { name: "Should Not Exist", kind: "farm" },
    });
    expect(write.status).toBe(403);
    expect(
      await db.select().from(customers).where(eq(customers.name, "Should Not Exist")),
    ).toHaveLength(0);
    expect(mine).toBeDefined();
    // The last-used time is recorded.
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, token.id));
    expect(row!.lastUsedAt).not.toBeNull();
  });

  it("a read-and-write token writes, and the change is in the audit log with the token's name", async () => {
    const token = await makeApiToken(db, team.admin.actor, ["read_write"], { name: "DMS sync" });
    const res = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { name: "Token Written Farm", kind: "farm" },
    });
    expect(res.status).toBe(201);
    const audit = await db
      .select()
      .from(auditEvents)
      .where(
        and(eq(auditEvents.dealershipId, team.dealershipId), eq(auditEvents.kind, "api_request")),
      );
    const line = audit.find((a) => a.subject === "DMS sync");
    expect(line?.detail).toMatchObject({ method: "POST", path: "/api/v1/customers", status: 201 });
    // Reports are their own scope.
    const reports = await bearer(listReports, token.authorization, "/api/v1/reports");
    expect(reports.status).toBe(200);
    const reportsOnly = await makeApiToken(db, team.admin.actor, ["reports"]);
    expect((await bearer(listReports, reportsOnly.authorization, "/api/v1/reports")).status).toBe(
      200,
    );
    expect(
      (await bearer(listCustomers, reportsOnly.authorization, "/api/v1/customers")).status,
    ).toBe(403);
  });

  it("answers 401 with the reason for a revoked, expired, unknown or orphaned token", async () => {
    const revoked = await makeApiToken(db, team.admin.actor, ["read"], { revoked: true });
    const expired = await makeApiToken(db, team.admin.actor, ["read"], { expired: true });
    const r1 = await bearer(listCustomers, revoked.authorization, "/api/v1/customers");
    expect(r1.status).toBe(401);
    expect(r1.body.error.message).toMatch(/revoked/);
    expect(r1.headers.get("www-authenticate")).toMatch(/^Bearer .*invalid_token/);
    const r2 = await bearer(listCustomers, expired.authorization, "/api/v1/customers");
    expect(r2.status).toBe(401);
    expect(r2.body.error.message).toMatch(/expired/);
    const r3 = await bearer(listCustomers, "Bearer tcapi_notarealtoken", "/api/v1/customers");
    expect(r3.status).toBe(401);
    // A token whose maker has left the dealership stops working.
    const leaver = await createTestMember({
      db,
      roles: ["dealer_admin"],
      dealershipId: team.dealershipId,
    });
    const orphan = await makeApiToken(db, leaver.actor, ["read"]);
    expect((await bearer(listCustomers, orphan.authorization, "/api/v1/customers")).status).toBe(
      200,
    );
    await db.delete(memberships).where(eq(memberships.userId, leaver.user.id));
    const r4 = await bearer(listCustomers, orphan.authorization, "/api/v1/customers");
    expect(r4.status).toBe(401);
    expect(r4.body.error.message).toMatch(/no longer works/);
    // Revoking through the verb takes effect on the next request.
    const live = await makeApiToken(db, team.admin.actor, ["read"]);
    expect((await bearer(listCustomers, live.authorization, "/api/v1/customers")).status).toBe(200);
    await revokeApiToken({ db, actor: team.admin.actor, tokenId: live.id });
    expect((await bearer(listCustomers, live.authorization, "/api/v1/customers")).status).toBe(401);
  });

  it("limits each token per minute with 429 and Retry-After, counted in PostgreSQL", async () => {
    const token = await makeApiToken(db, team.admin.actor, ["read"], { requestsPerMinute: 2 });
    const other = await makeApiToken(db, team.admin.actor, ["read"], { requestsPerMinute: 2 });
    const statuses: number[] = [];
    let retryAfter: string | null = null;
    for (let i = 0; i < 3; i++) {
      const res = await bearer(listCustomers, token.authorization, "/api/v1/customers");
      statuses.push(res.status);
      if (res.status === 429) {
        retryAfter = res.headers.get("retry-after");
        expect(res.body.error.code).toBe("rate_limited");
      }
    }
    // A minute boundary between the calls would reset the window; then only two are counted.
    if (!statuses.includes(429)) return;
    expect(statuses).toEqual([200, 200, 429]);
    expect(Number(retryAfter)).toBeGreaterThanOrEqual(1);
    expect(Number(retryAfter)).toBeLessThanOrEqual(60);
    // Counters are per token.
    expect((await bearer(listCustomers, other.authorization, "/api/v1/customers")).status).toBe(
      200,
    );
  });
});

describe("Idempotency-Key on creating POSTs", () => {
  it("a repeated request with the same key returns the first result and creates one record", async () => {
    const token = await makeApiToken(db, team.admin.actor, ["read_write"]);
    const body = { name: "Idempotent Acres", kind: "farm" };
    const headers = { "idempotency-key": "import-2026-12-04-001" };
    const first = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body,
      headers,
    });
    const again = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body,
      headers,
    });
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(again.headers.get("idempotent-replayed")).toBe("true");
    const rows = await db
      .select()
      .from(customers)
      .where(
        and(eq(customers.dealershipId, team.dealershipId), eq(customers.name, "Idempotent Acres")),
      );
    expect(rows).toHaveLength(1);
    // The same key with another body is refused and creates nothing.
    const changed = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { ...body, name: "Different Acres" },
      headers,
    });
    expect(changed.status).toBe(422);
    expect(changed.body.error.code).toBe("idempotency_key_reused");
    expect(
      await db.select().from(customers).where(eq(customers.name, "Different Acres")),
    ).toHaveLength(0);
    // Keys belong to their caller: another token with the same key makes its own record.
    const second = await makeApiToken(db, team.admin.actor, ["read_write"]);
    const theirs = await bearer(createCustomer, second.authorization, "/api/v1/customers", {
      method: "POST",
      body,
      headers,
    });
    expect(theirs.status).toBe(201);
    expect(theirs.body.id).not.toBe(first.body.id);
  });

  it("a refused request is not remembered, so the corrected retry with the same key works", async () => {
    const token = await makeApiToken(db, team.admin.actor, ["read_write"]);
    const headers = { "idempotency-key": "retry-after-fix" };
    const bad = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { name: "", kind: "farm" },
      headers,
    });
    expect(bad.status).toBe(400);
    const bad2 = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { name: "", kind: "farm" },
      headers,
    });
    expect(bad2.status).toBe(400);
    expect(bad2.headers.get("idempotent-replayed")).toBeNull();
    const invalidKey = await bearer(createCustomer, token.authorization, "/api/v1/customers", {
      method: "POST",
      body: { name: "Key Check Farm", kind: "farm" },
      headers: { "idempotency-key": "has spaces" },
    });
    expect(invalidKey.status).toBe(400);
  });

  it("works for a signed-in session too, keyed by the person", async () => {
    const headers = { "idempotency-key": "browser-key-1", cookie: team.estimator.cookie };
    const make = () =>
      createCustomer(
        new Request(`${BASE}/api/v1/customers`, {
          method: "POST",
          headers: { ...headers, "content-type": "application/json" },
          body: JSON.stringify({ name: "Session Idem Farm", kind: "farm" }),
        }),
        { params: Promise.resolve({}) },
      );
    const a = (await (await make()).json()) as { id: string };
    const b = (await (await make()).json()) as { id: string };
    expect(b.id).toBe(a.id);
  });
});
