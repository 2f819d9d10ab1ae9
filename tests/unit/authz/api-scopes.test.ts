import { describe, expect, it } from "vitest";
import type { TActor } from "@/lib/authz/actor";
import { grantsOfScopes, SCOPE_GRANTS } from "@/lib/authz/api-scopes";
import { ACTIONS, can } from "@/lib/authz/policy";

// Token scopes narrow what the token's maker may do (policy of this product, no outside source).

const admin: TActor = {
  userId: "u1",
  email: "admin@example.test",
  name: "Admin",
  dealershipId: "d1",
  roles: ["dealer_admin"],
  customerId: null,
  unitSystem: "metric",
  currency: "EUR",
};
const withToken = (scopes: string[]): TActor => ({
  ...admin,
  apiToken: { id: "t1", name: "test", grants: grantsOfScopes(scopes) },
});

describe("API token scopes", () => {
  it("only grant actions the policy knows", () => {
    for (const grants of Object.values(SCOPE_GRANTS))
      for (const action of grants) expect(ACTIONS).toContain(action);
  });

  it("never reach people, billing, the audit log or anyone's account", () => {
    const all = grantsOfScopes(["read", "read_write", "reports"]);
    for (const action of [
      "staff:manage",
      "billing:manage",
      "audit:read",
      "account:manage",
    ] as const)
      expect(all.has(action)).toBe(false);
  });

  it("read reads and cannot write; read_write writes; reports is reports only", () => {
    const read = withToken(["read"]);
    expect(can(read, "estimate:read")).toBe(true);
    expect(can(read, "customer:write")).toBe(false);
    expect(can(read, "estimate:run")).toBe(false);
    expect(can(read, "report:share")).toBe(false);
    const write = withToken(["read_write"]);
    expect(can(write, "duty-cycle:write")).toBe(true);
    expect(can(write, "estimate:run")).toBe(true);
    expect(can(write, "report:share")).toBe(false);
    const reports = withToken(["reports"]);
    expect(can(reports, "report:share")).toBe(true);
    expect(can(reports, "report:read")).toBe(true);
    expect(can(reports, "customer:read")).toBe(false);
    expect(can(withToken(["read", "reports"]), "report:share")).toBe(true);
  });

  it("never widen the maker's own role, nor cross into another dealership", () => {
    const billingMaker: TActor = { ...withToken(["read_write"]), roles: ["billing_admin"] };
    expect(can(billingMaker, "customer:write")).toBe(false);
    expect(can(withToken(["read"]), "customer:read", { dealershipId: "other" })).toBe(false);
    // The same person signed in (no token) keeps everything their role allows.
    expect(can(admin, "staff:manage")).toBe(true);
    expect(can(withToken(["read_write"]), "staff:manage")).toBe(false);
  });
});
