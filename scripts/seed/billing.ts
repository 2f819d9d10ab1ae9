import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingAccounts, billingPlans, type TDealership } from "@/db/schema";

/**
 * Treadcast's report plans: invented names and prices, kept as data so they change without a
 * release. Amounts in pence.
 */
export const DEMO_PLANS = [
  {
    key: "tc-trial-14d",
    name: "Starter trial",
    kind: "trial",
    description: "14 days free, up to 10 quote reports. No card needed.",
    currency: "gbp",
    priceMinor: 0,
    includedReports: 10,
    overageMinor: null,
    trialDays: 14,
    sortOrder: 0,
  },
  {
    key: "tc-bundle-10",
    name: "Ten-report bundle",
    kind: "pack",
    description: "10 quote reports to use whenever you like, on top of any plan.",
    currency: "gbp",
    priceMinor: 4500,
    includedReports: 10,
    overageMinor: null,
    trialDays: null,
    sortOrder: 1,
  },
  {
    key: "tc-yard-monthly",
    name: "Yard monthly",
    kind: "monthly",
    description: "25 quote reports a month; further reports at £2.50 each on the next invoice.",
    currency: "gbp",
    priceMinor: 3900,
    includedReports: 25,
    overageMinor: 250,
    trialDays: null,
    sortOrder: 2,
  },
  {
    key: "tc-yard-annual",
    name: "Yard annual",
    kind: "annual",
    description: "40 quote reports a month, paid yearly; further reports at £2.00 each.",
    currency: "gbp",
    priceMinor: 42000,
    includedReports: 40,
    overageMinor: 200,
    trialDays: null,
    sortOrder: 3,
  },
] as const;

export async function seedBillingPlans(db: Db): Promise<number> {
  for (const plan of DEMO_PLANS) {
    const { key, ...rest } = plan;
    await db
      .insert(billingPlans)
      .values({ key, ...rest })
      .onConflictDoUpdate({ target: billingPlans.key, set: rest });
  }
  return DEMO_PLANS.length;
}

/**
 * Demo billing state: the demo dealership on a fresh trial with its billing address set, so
 * a billing admin can subscribe through the local checkout. Kept if it already exists.
 */
export async function seedBilling(
  db: Db,
  opts: { dealerships: TDealership[]; billingEmail: string },
) {
  const plans = await seedBillingPlans(db);
  const trial = DEMO_PLANS[0];
  for (const d of opts.dealerships) {
    const now = new Date();
    await db
      .insert(billingAccounts)
      .values({
        dealershipId: d.id,
        status: "trialing",
        planKey: trial.key,
        trialStartedAt: now,
        trialEndsAt: new Date(now.getTime() + trial.trialDays * 86_400_000),
      })
      .onConflictDoNothing();
  }
  const [main] = opts.dealerships;
  if (main)
    await db
      .update(billingAccounts)
      .set({ billingEmail: opts.billingEmail })
      .where(eq(billingAccounts.dealershipId, main.id));
  return plans;
}
