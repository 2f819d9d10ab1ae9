import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingPlans, type TBillingPlan } from "@/db/schema";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/** The provider's price id for a plan, looked up (or created) once and then kept on the plan. */
export async function ensurePlanPrice(
  db: Db,
  provider: TBillingProvider,
  plan: TBillingPlan,
): Promise<string> {
  if (plan.providerPriceId) return plan.providerPriceId;
  const price = await provider.ensurePrice(plan);
  await db
    .update(billingPlans)
    .set({ providerPriceId: price.id })
    .where(eq(billingPlans.key, plan.key));
  return price.id;
}
