import "server-only";
import { and, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingPlans } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { loadAccount } from "@/features/billing/server/load-account";
import {
  NOT_BILLING_ADMIN,
  withProviderErrors,
  type TBillingResult,
} from "@/features/billing/server/billing-result";
import { ensurePlanPrice } from "@/features/billing/server/ensure-plan-price";
import type { TBillingProvider } from "@/features/billing/server/stripe";
import { syncSubscription } from "@/features/billing/server/sync";

type TChange = { kind: "switch"; planKey: string } | { kind: "cancel" } | { kind: "resume" };

/**
 * Changes the running subscription: switch plan (prorated by the provider), stop at the end of
 * the period, or keep it running. Our copy is refreshed from the provider's answer.
 */
export async function changeSubscription(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
  change: TChange;
}): Promise<TBillingResult> {
  const { db, provider, actor, change } = opts;
  if (!can(actor, "billing:manage")) return NOT_BILLING_ADMIN;
  const { account } = await loadAccount(db, actor.dealershipId);
  const subscriptionId = account.providerSubscriptionId;
  if (!subscriptionId || account.status === "cancelled")
    return {
      ok: false,
      code: "conflict",
      message: "There is no running plan to change. Choose a plan to subscribe.",
    };
  return withProviderErrors(async () => {
    if (change.kind === "switch") {
      const [plan] = await db
        .select()
        .from(billingPlans)
        .where(and(eq(billingPlans.key, change.planKey), eq(billingPlans.active, true)));
      if (!plan || (plan.kind !== "monthly" && plan.kind !== "annual"))
        return {
          ok: false,
          code: "not_found",
          message: "Pick a monthly or annual plan to switch to.",
        };
      if (plan.key === account.planKey)
        return {
          ok: false,
          code: "conflict",
          message: `The dealership is already on ${plan.name}.`,
        };
      const sub = await provider.retrieveSubscription(subscriptionId);
      const item = sub.items.data[0];
      if (!item)
        return { ok: false, code: "provider_error", message: "The plan has no line to change." };
      const priceId = await ensurePlanPrice(db, provider, plan);
      await provider.changeSubscriptionPrice({ subscriptionId, itemId: item.id, priceId });
    } else {
      await provider.setCancelAtPeriodEnd(subscriptionId, change.kind === "cancel");
    }
    await syncSubscription({ db, provider }, subscriptionId);
    return { ok: true };
  });
}
