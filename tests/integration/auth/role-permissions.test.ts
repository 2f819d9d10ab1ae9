import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb, getPool } from "@/db/client";
import { customers } from "@/db/schema";
import type { TRole } from "@/lib/authz/actor";
import { GET as listCustomers, POST as createCustomer } from "@/app/api/v1/customers/route";
import { GET as getCustomer, PATCH as patchCustomer } from "@/app/api/v1/customers/[id]/route";
import {
  createTestDealership,
  createTestMember,
  requestAs,
  uniqueTag,
} from "@/tests/support/session";

// Each role's allowed and refused actions, through the real route handlers and PostgreSQL.
// Expectations come from the role descriptions in the accounts issue.
const db = getDb();
const tag = uniqueTag();
let dealershipId: string;
let own: { id: string; name: string };
let other: { id: string; name: string };
const cookies = {} as Record<TRole, string>;

beforeAll(async () => {
  dealershipId = (await createTestDealership(db)).id;
  const rows = await db
    .insert(customers)
    .values([
      { dealershipId, name: `Own Farm ${tag}` },
      { dealershipId, name: `Other Farm ${tag}` },
    ])
    .returning();
  own = rows[0]!;
  other = rows[1]!;
  for (const role of ["dealer_admin", "estimator", "billing_admin", "customer"] as TRole[]) {
    const m = await createTestMember({
      db,
      roles: [role],
      dealershipId,
      customerId: role === "customer" ? own.id : undefined,
    });
    cookies[role] = m.cookie;
  }
});
afterAll(async () => {
  await getPool().end();
});

const ctx = (id?: string) => ({ params: Promise.resolve(id ? { id } : {}) });

describe("customer records by role", () => {
  it.each([
    ["dealer_admin", 201],
    ["estimator", 201],
    ["billing_admin", 403],
    ["customer", 403],
  ] as const)("%s creating a customer → %i", async (role, status) => {
    const res = await createCustomer(
      requestAs(cookies[role], "/api/v1/customers", {
        method: "POST",
        body: { name: `New Farm ${role} ${tag}` },
      }),
      ctx(),
    );
    expect(res.status).toBe(status);
  });

  it.each([
    ["dealer_admin", 200],
    ["estimator", 200],
    ["billing_admin", 403],
    ["customer", 403],
  ] as const)("%s changing a customer's notes → %i", async (role, status) => {
    const res = await patchCustomer(
      requestAs(cookies[role], `/api/v1/customers/${own.id}`, {
        method: "PATCH",
        body: { notes: `changed by ${role}` },
      }),
      ctx(own.id),
    );
    // A customer account may read its own record but never change it.
    expect(res.status).toBe(status);
  });

  it.each(["dealer_admin", "estimator", "billing_admin"] as const)(
    "%s lists every customer of the dealership",
    async (role) => {
      const res = await listCustomers(requestAs(cookies[role], "/api/v1/customers"), ctx());
      expect(res.status).toBe(200);
      const body = await res.text();
      expect(body).toContain(own.name);
      expect(body).toContain(other.name);
    },
  );

  it("a customer account lists and reads only its own customer record", async () => {
    const list = await listCustomers(requestAs(cookies.customer, "/api/v1/customers"), ctx());
    expect(list.status).toBe(200);
    const body = await list.text();
    expect(body).toContain(own.name);
    expect(body).not.toContain(other.name);
    const mine = await getCustomer(
      requestAs(cookies.customer, `/api/v1/customers/${own.id}`),
      ctx(own.id),
    );
    expect(mine.status).toBe(200);
    const theirs = await getCustomer(
      requestAs(cookies.customer, `/api/v1/customers/${other.id}`),
      ctx(other.id),
    );
    expect([403, 404]).toContain(theirs.status);
    expect(await theirs.text()).not.toContain(other.name);
  });
});
