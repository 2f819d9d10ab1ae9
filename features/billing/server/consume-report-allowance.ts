import "server-only";
import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { billingAccounts, billingPlans, reportAllowanceUses } from "@/db/schema";
import { allowancePeriod, decideAllowance } from "@/lib/billing/allowance";
import { ReportAllowanceError } from "@/features/billing/server/allowance-error";
import { countUsedInPeriod } from "@/features/billing/server/count-used-in-period";

export type TAllowanceUse = {
  useId: string;
  reportId: string;
  source: "included" | "pack" | "overage";
  planName: string | null;
  periodStart: Date;
  periodEnd: Date;
  /** Reports counted against the included allowance in the period, this one included. */
  used: number;
  /** Included reports in the period; null with pack credit only. */
  included: number | null;
  /** True when this report was already counted (a retried issue). */
  replayed: boolean;
};

/**
 * Checks and records one issued report inside the caller's transaction. The billing account row
 * is locked (`for update`), so concurrent issues queue behind one another and never pass the
 * quota; the use row is unique per report, so a retried issue counts once.
 */
export async function consumeReportAllowance(
  tx: DbOrTx,
  options: { dealershipId: string; reportId: string },
): Promise<TAllowanceUse> {
  const { dealershipId, reportId } = options;
  const [row] = await tx
    .select({ account: billingAccounts, plan: billingPlans })
    .from(billingAccounts)
    .leftJoin(billingPlans, eq(billingPlans.key, billingAccounts.planKey))
    .where(eq(billingAccounts.dealershipId, dealershipId))
    .for("update", { of: billingAccounts });
  if (!row) throw new ReportAllowanceError("no_plan");
  const { account, plan } = row;
  const now = new Date();
  const period = allowancePeriod({ ...account, now });
  const used = await countUsedInPeriod(tx, { ...account, dealershipId, period });
  const base = {
    reportId,
    planName: plan?.name ?? null,
    periodStart: period.start,
    periodEnd: period.end,
    included: plan && plan.kind !== "pack" ? plan.includedReports : null,
  };

  const [previous] = await tx
    .select()
    .from(reportAllowanceUses)
    .where(eq(reportAllowanceUses.reportId, reportId));
  if (previous) {
    const source = previous.source as TAllowanceUse["source"];
    return { ...base, useId: previous.id, source, used, replayed: true };
  }

  const decision = decideAllowance({ ...account, plan, usedInPeriod: used, now });
  if (!decision.ok) throw new ReportAllowanceError(decision.code);
  if (decision.source === "pack") {
    await tx
      .update(billingAccounts)
      .set({ packCredits: sql`${billingAccounts.packCredits} - 1`, updatedAt: now })
      .where(eq(billingAccounts.dealershipId, dealershipId));
  }
  const [use] = await tx
    .insert(reportAllowanceUses)
    .values({ dealershipId, reportId, planKey: plan?.key ?? null, source: decision.source })
    .returning();
  return {
    ...base,
    useId: use!.id,
    source: decision.source,
    used: decision.source === "pack" ? used : used + 1,
    replayed: false,
  };
}
