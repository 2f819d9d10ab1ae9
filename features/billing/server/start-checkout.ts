import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingPlans } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ensureProviderCustomer, loadAccount } from "@/features/billing/server/load-account";
import {
  NOT_BILLING_ADMIN,
  withProviderErrors,
  type TBillingResult,
} from "@/features/billing/server/billing-result";
import { ensurePlanPrice } from "@/features/billing/server/ensure-plan-price";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/**
 * Sends the billing admin to the provider's checkout for a plan: a subscription for monthly
 * and annual plans, a one-off payment for a bundle. Nothing changes here until it is paid.
 */
export async function startCheckout(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
  planKey: string;
  appUrl: string;
}): Promise<TBillingResult<{ url: string }>> {
  const { db, provider, actor } = opts;
  if (!can(actor, "billing:manage")) return NOT_BILLING_ADMIN;
  const [plan] = await db
    .select()
    .from(billingPlans)
    .where(and(eq(billingPlans.key, opts.planKey), eq(billingPlans.active, true)));
  if (!plan || plan.kind === "trial")
    return {
      ok: false,
      code: "not_found",
      message: "That plan is not on sale. Pick one from the list.",
    };
  const { account } = await loadAccount(db, actor.dealershipId);
  if (plan.kind !== "pack" && account.providerSubscriptionId && account.status !== "cancelled")
    return {
      ok: false,
      code: "conflict",
      message: "The dealership already has a running plan. Use “Switch to this plan” instead.",
    };
  return withProviderErrors<{ url: string }>(async () => {
    const customerId = await ensureProviderCustomer(db, provider, actor.dealershipId);
    const priceId = await ensurePlanPrice(db, provider, plan);
    const session = await provider.createCheckoutSession({
      customerId,
      priceId,
      mode: plan.kind === "pack" ? "payment" : "subscription",
      dealershipId: actor.dealershipId,
      planKey: plan.key,
      successUrl: `${opts.appUrl}/billing?checkout=done&session_id={CHECKOUT_SESSION_ID}`,
      cancelUrl: `${opts.appUrl}/billing?checkout=cancelled`,
    });
    if (!session.url)
      return {
        ok: false,
        code: "provider_error",
        message: "The payment service gave no checkout page.",
      };
    return { ok: true, value: { url: session.url } };
  });
}
