import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingPlans, type TBillingPlan } from "@/db/schema";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/**
 * The provider's price id for a plan, found by the plan's lookup key (or created) and kept on the
 * plan. The provider is asked each time (one lookup, at checkout or a plan change): a kept id
 * from another provider account, or from a test service that was reset, would otherwise fail
 * the checkout with "No such price".
 */
export async function ensurePlanPrice(
  db: Db,
  provider: TBillingProvider,
  plan: TBillingPlan,
): Promise<string> {
  const price = await provider.ensurePrice(plan);
  if (price.id !== plan.providerPriceId) {
    await db
      .update(billingPlans)
      .set({ providerPriceId: price.id })
      .where(eq(billingPlans.key, plan.key));
  }
  return price.id;
}
