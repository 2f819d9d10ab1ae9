import "server-only";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ApiError, notFound } from "@/features/platform";

type TOwned = { dealershipId: string; customerId: string | null } | undefined;

/**
 * Studies follow the estimate rules: anyone who may read estimates reads them (a customer only
 * their own: others answer 404), only roles that run estimates create or rerun them.
 */
export function assertMayRead(actor: TActor, row: TOwned, what: string): asserts row {
  if (!row || !can(actor, "estimate:read", row)) throw notFound(what);
}

export function assertMayRun(actor: TActor) {
  if (!can(actor, "estimate:run"))
    throw new ApiError(403, "forbidden", "Your role may not run comparisons or sweeps.");
}
