import "server-only";
import type { Db } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import {
  NOT_BILLING_ADMIN,
  withProviderErrors,
  type TBillingResult,
} from "@/features/billing/server/billing-result";
import type { TBillingProvider } from "@/features/billing/server/stripe";
import { syncCheckoutSession } from "@/features/billing/server/sync";

/**
 * On return from checkout, applies the session at once instead of waiting for its webhook
 * (the same idempotent sync the webhook runs). Another dealership's session changes nothing.
 */
export async function confirmCheckout(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
  sessionId: string;
}): Promise<TBillingResult<{ state: "applied" | "not_paid" }>> {
  const { db, provider, actor } = opts;
  if (!can(actor, "billing:manage")) return NOT_BILLING_ADMIN;
  return withProviderErrors<{ state: "applied" | "not_paid" }>(async () => {
    const session = await provider.retrieveCheckoutSession(opts.sessionId);
    const owner = session.client_reference_id ?? session.metadata?.dealershipId;
    if (owner !== actor.dealershipId)
      return { ok: false, code: "not_found", message: "That checkout was not found." };
    const state = await syncCheckoutSession({ db, provider }, opts.sessionId);
    return { ok: true, value: { state: state === "applied" ? "applied" : "not_paid" } };
  });
}
