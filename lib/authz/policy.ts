import type { TActor, TOwned, TRole } from "@/lib/authz/actor";

/**
 * What a signed-in person may do. Pure predicates: the server path resolves the actor and
 * the resource from the database, then asks `can`. Nothing here reads the request.
 */
export const ACTIONS = [
  "customer:read",
  "customer:write",
  "site:read",
  "site:write",
  "machine:read",
  "machine:write",
  "duty-cycle:read",
  "duty-cycle:write",
  "estimate:read",
  "estimate:write",
  "estimate:run",
  "report:read",
  "report:share",
  "staff:manage",
  "billing:manage",
  "billing:read",
  "audit:read",
  "mapping-template:write",
  "account:manage",
] as const;

export type TAction = (typeof ACTIONS)[number];

/**
 * Reads a customer account may make, limited to its own customer record. Duty cycles and
 * estimates are the dealer's working material: a customer reads what the dealer shares with
 * them as reports, never the drafts behind them.
 */
const CUSTOMER_READS: readonly TAction[] = [
  "customer:read",
  "site:read",
  "machine:read",
  "report:read",
];

const STAFF_READS: readonly TAction[] = [...CUSTOMER_READS, "duty-cycle:read", "estimate:read"];

const WORKSPACE_WRITES: readonly TAction[] = [
  "customer:write",
  "site:write",
  "machine:write",
  "duty-cycle:write",
  "estimate:write",
  "estimate:run",
  "report:share",
  "mapping-template:write",
];

/** Every role may manage its own account (password, unit preference, active dealership). */
const SELF: readonly TAction[] = ["account:manage"];

export const ROLE_GRANTS: Record<TRole, ReadonlySet<TAction>> = {
  dealer_admin: new Set([
    ...SELF,
    ...STAFF_READS,
    ...WORKSPACE_WRITES,
    "staff:manage",
    "audit:read",
    "billing:manage",
    "billing:read",
  ]),
  // Estimators see the report counter (and why issuing is blocked), not the plan's controls.
  estimator: new Set([...SELF, ...STAFF_READS, ...WORKSPACE_WRITES, "billing:read"]),
  billing_admin: new Set([...SELF, ...STAFF_READS, "billing:manage", "billing:read"]),
  customer: new Set([...SELF, ...CUSTOMER_READS]),
};

export const STAFF_ROLES: readonly TRole[] = ["dealer_admin", "estimator", "billing_admin"];

export function isStaff(actor: TActor): boolean {
  return actor.roles.some((r) => STAFF_ROLES.includes(r));
}

function roleAllows(role: TRole, actor: TActor, action: TAction, resource?: TOwned): boolean {
  if (!ROLE_GRANTS[role].has(action)) return false;
  if (role !== "customer" || !resource) return true;
  // A customer account sees only resources tied to its own customer record; a resource with
  // no customer (a dealership template) is staff-only.
  return actor.customerId !== null && resource.customerId === actor.customerId;
}

/**
 * May `actor` do `action` (to `resource`, when given)? Without a resource the answer is about
 * the kind of action, e.g. whether a list may be asked for; the list must still be filtered
 * with `readScope`. Another dealership's resource is always refused.
 */
export function can(actor: TActor, action: TAction, resource?: TOwned): boolean {
  if (resource && resource.dealershipId !== actor.dealershipId) return false;
  if (actor.apiToken && !actor.apiToken.grants.has(action)) return false;
  return actor.roles.some((role) => roleAllows(role, actor, action, resource));
}

/**
 * The filter every read query applies: the active dealership, and for a customer account
 * with no staff role, its one customer record.
 */
export function readScope(actor: TActor): { dealershipId: string; customerId: string | null } {
  if (isStaff(actor)) return { dealershipId: actor.dealershipId, customerId: null };
  // Never widen a customer account to the whole dealership.
  if (!actor.customerId) throw new Error("A customer account must be tied to a customer record.");
  return { dealershipId: actor.dealershipId, customerId: actor.customerId };
}

/** Roles a dealer admin may hand out by invitation. */
export const INVITABLE_ROLES: readonly TRole[] = [
  "dealer_admin",
  "estimator",
  "billing_admin",
  "customer",
];

export const ROLE_LABELS: Record<TRole, string> = {
  dealer_admin: "Dealer admin",
  estimator: "Estimator",
  billing_admin: "Billing admin",
  customer: "Customer",
};
