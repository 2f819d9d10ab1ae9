import { describe, expect, it } from "vitest";
import type { TActor, TRole } from "@/lib/authz/actor";
import { ACTIONS, can, readScope, type TAction } from "@/lib/authz/policy";

// The role descriptions in the accounts issue are the source for these expectations.
const D = "dealership-a";
const OTHER_D = "dealership-b";
const CUST = "customer-1";
const OTHER_CUST = "customer-2";

function actor(roles: TRole[], customerId: string | null = null): TActor {
  return {
    userId: "u",
    email: "u@example.test",
    name: "U",
    dealershipId: D,
    roles,
    customerId,
    unitSystem: "metric",
    currency: "EUR",
  };
}

const READS: TAction[] = [
  "customer:read",
  "site:read",
  "machine:read",
  "duty-cycle:read",
  "estimate:read",
  "report:read",
];
const WRITES: TAction[] = [
  "customer:write",
  "site:write",
  "machine:write",
  "duty-cycle:write",
  "estimate:write",
  "estimate:run",
  "report:share",
  "mapping-template:write",
];

/**
 * Expected grants per role, written out independently of the policy's own tables. Billing: the
 * billing issue gives plan controls to billing and dealer admins, the counter to every staff role.
 */
const EXPECTED: Record<TRole, TAction[]> = {
  dealer_admin: [
    ...READS,
    ...WRITES,
    "staff:manage",
    "audit:read",
    "account:manage",
    "billing:manage",
    "billing:read",
  ],
  estimator: [...READS, ...WRITES, "account:manage", "billing:read"],
  billing_admin: [...READS, "billing:manage", "billing:read", "account:manage"],
  // Duty cycles and estimates stay with the dealer; the customer reads shared reports.
  customer: [
    ...READS.filter((a) => a !== "duty-cycle:read" && a !== "estimate:read"),
    "account:manage",
  ],
};

describe("can: role grants inside the actor's own dealership", () => {
  const rows = (Object.keys(EXPECTED) as TRole[]).flatMap((role) =>
    ACTIONS.map((action) => ({ role, action, allowed: EXPECTED[role].includes(action) })),
  );
  it.each(rows)("$role $action → $allowed", ({ role, action, allowed }) => {
    const a = actor([role], role === "customer" ? CUST : null);
    const own = { dealershipId: D, customerId: CUST };
    expect(can(a, action, own)).toBe(allowed);
  });
});

describe("can: another dealership's resource is always refused", () => {
  const rows = (Object.keys(EXPECTED) as TRole[]).flatMap((role) =>
    ACTIONS.map((action) => ({ role, action })),
  );
  it.each(rows)("$role $action on a foreign resource → false", ({ role, action }) => {
    const a = actor([role], role === "customer" ? CUST : null);
    expect(can(a, action, { dealershipId: OTHER_D, customerId: CUST })).toBe(false);
  });
});

describe("can: customer accounts see only their own customer record", () => {
  const a = actor(["customer"], CUST);
  it.each(EXPECTED.customer.filter((x) => x !== "account:manage"))(
    "%s of their own record is allowed",
    (action) => {
      expect(can(a, action, { dealershipId: D, customerId: CUST })).toBe(true);
    },
  );
  it.each(READS)("%s of another customer's record is refused", (action) => {
    expect(can(a, action, { dealershipId: D, customerId: OTHER_CUST })).toBe(false);
  });
  it.each(READS)("%s of a dealership template (no customer) is refused", (action) => {
    expect(can(a, action, { dealershipId: D, customerId: null })).toBe(false);
  });
  it.each(["duty-cycle:read", "estimate:read"] as TAction[])(
    "%s is refused even for their own record: drafts stay with the dealer",
    (action) => {
      expect(can(a, action, { dealershipId: D, customerId: CUST })).toBe(false);
    },
  );
  it("a customer role with no customer record reads nothing", () => {
    expect(
      can(actor(["customer"], null), "machine:read", { dealershipId: D, customerId: null }),
    ).toBe(false);
  });
});

describe("can: combined roles", () => {
  it("a dealer admin who is also billing admin may manage billing and staff", () => {
    const a = actor(["dealer_admin", "billing_admin"]);
    expect(can(a, "billing:manage")).toBe(true);
    expect(can(a, "staff:manage")).toBe(true);
  });
  it("no roles means no grants", () => {
    for (const action of ACTIONS) expect(can(actor([]), action)).toBe(false);
  });
});

describe("readScope", () => {
  it("staff read the whole active dealership", () => {
    expect(readScope(actor(["estimator"]))).toEqual({ dealershipId: D, customerId: null });
  });
  it("a customer account is narrowed to its customer record", () => {
    expect(readScope(actor(["customer"], CUST))).toEqual({ dealershipId: D, customerId: CUST });
  });
  it("a customer account without a record is never widened to the dealership", () => {
    expect(() => readScope(actor(["customer"], null))).toThrow(/customer record/);
  });
});
