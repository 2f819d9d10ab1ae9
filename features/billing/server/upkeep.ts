// Hourly billing upkeep in the worker: trial-ending mails, overage charges, stranded events.
// No "server-only" marker.
import { and, eq, gt, isNull, lt, lte, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import {
  billingAccounts,
  billingPlans,
  billingWebhookEvents,
  reportAllowanceUses,
} from "@/db/schema";
import { sendTrialEndingMail } from "@/features/billing/server/billing-mails";
import type { TBillingDeps } from "@/features/billing/server/deps";

const DAY_MS = 86_400_000;

/** Mails each trial once when it has 3 days or less to run. */
export async function mailEndingTrials(
  deps: Pick<TBillingDeps, "db" | "mailer">,
  now = new Date(),
): Promise<number> {
  const { db } = deps;
  const due = await db
    .select()
    .from(billingAccounts)
    .where(
      and(
        eq(billingAccounts.status, "trialing"),
        isNull(billingAccounts.trialEndingMailSentAt),
        gt(billingAccounts.trialEndsAt, now),
        lte(billingAccounts.trialEndsAt, new Date(now.getTime() + 3 * DAY_MS)),
      ),
    );
  let sent = 0;
  for (const account of due) {
    // Claim first, so two workers never both mail the same trial.
    const [claimed] = await db
      .update(billingAccounts)
      .set({ trialEndingMailSentAt: now })
      .where(
        and(
          eq(billingAccounts.dealershipId, account.dealershipId),
          isNull(billingAccounts.trialEndingMailSentAt),
        ),
      )
      .returning();
    if (!claimed) continue;
    await sendTrialEndingMail(deps, {
      dealershipId: account.dealershipId,
      trialEndsAt: account.trialEndsAt!,
    });
    sent += 1;
  }
  return sent;
}

/** Sends reports issued beyond the included ones to the provider as invoice items. */
export async function billOverage({
  db,
  provider,
}: Pick<TBillingDeps, "db" | "provider">): Promise<number> {
  const rows = await db
    .select({ use: reportAllowanceUses, plan: billingPlans, account: billingAccounts })
    .from(reportAllowanceUses)
    .innerJoin(billingPlans, eq(billingPlans.key, reportAllowanceUses.planKey))
    .innerJoin(billingAccounts, eq(billingAccounts.dealershipId, reportAllowanceUses.dealershipId))
    .where(
      and(eq(reportAllowanceUses.source, "overage"), isNull(reportAllowanceUses.overageBilledAt)),
    )
    .limit(500);
  let billed = 0;
  for (const { use, plan, account } of rows) {
    if (!account.providerCustomerId || plan.overageMinor === null) continue;
    await provider.createOverageItem({
      customerId: account.providerCustomerId,
      useId: use.id,
      amountMinor: plan.overageMinor,
      currency: plan.currency,
      description: `Quote report beyond the ${plan.includedReports} included in ${plan.name}`,
    });
    await db
      .update(reportAllowanceUses)
      .set({ overageBilledAt: new Date() })
      .where(eq(reportAllowanceUses.id, use.id));
    billed += 1;
  }
  return billed;
}

/** Events recorded but never worked (a worker died between accept and job): their ids. */
export async function strandedEvents(db: Db, olderThanMs = 10 * 60_000): Promise<string[]> {
  const rows = await db
    .select({ id: billingWebhookEvents.eventId })
    .from(billingWebhookEvents)
    .where(
      and(
        isNull(billingWebhookEvents.processedAt),
        lt(
          billingWebhookEvents.receivedAt,
          sql`now() - ${`${olderThanMs} milliseconds`}::interval`,
        ),
      ),
    )
    .limit(200);
  return rows.map((r) => r.id);
}
