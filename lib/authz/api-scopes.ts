import type { TAction } from "@/lib/authz/policy";

/** What an API token may be allowed to do. A token holds one or more. */
export const API_SCOPES = ["read", "read_write", "reports"] as const;
export type TApiScope = (typeof API_SCOPES)[number];

const READS: readonly TAction[] = [
  "customer:read",
  "site:read",
  "machine:read",
  "duty-cycle:read",
  "estimate:read",
  "report:read",
  "billing:read",
];

const WRITES: readonly TAction[] = [
  "customer:write",
  "site:write",
  "machine:write",
  "duty-cycle:write",
  "estimate:write",
  "estimate:run",
  "mapping-template:write",
];

/**
 * Actions each scope allows. No scope reaches people, billing, the audit log or anyone's
 * account: those stay with a signed-in person. Issuing and sharing reports is its own scope,
 * because it is what a customer sees and what the plan counts.
 */
export const SCOPE_GRANTS: Record<TApiScope, readonly TAction[]> = {
  read: READS,
  read_write: [...READS, ...WRITES],
  reports: ["report:read", "report:share"],
};

export const SCOPE_LABELS: Record<TApiScope, string> = {
  read: "Read",
  read_write: "Read and write",
  reports: "Reports (read, issue, share)",
};

/** The union of the actions the scopes allow. */
export function grantsOfScopes(scopes: readonly string[]): ReadonlySet<TAction> {
  const out = new Set<TAction>();
  for (const scope of scopes) {
    const grants = SCOPE_GRANTS[scope as TApiScope];
    if (grants) for (const action of grants) out.add(action);
  }
  return out;
}
