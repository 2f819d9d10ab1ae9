import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { billingAccounts, billingPlans, type TBillingStatus } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import {
  allowancePeriod,
  BLOCK_MESSAGES,
  decideAllowance,
  graceEndsAt,
  type TBlockCode,
} from "@/lib/billing/allowance";
import { BILLING_HREF } from "@/features/billing/server/allowance-error";
import { countUsedInPeriod } from "@/features/billing/server/count-used-in-period";

export type TAllowanceSummary = {
  planKey: string | null;
  planName: string | null;
  planKind: "trial" | "pack" | "monthly" | "annual" | null;
  state: TBillingStatus;
  used: number;
  /** Included reports in the period; null with no plan. */
  included: number | null;
  packCredits: number;
  periodStart: string;
  periodEnd: string;
  /** Set when new reports are blocked, with words for the estimator. */
  blocked: { code: TBlockCode; message: string; billingHref: string } | null;
  /** The past-due grace period's end, for the banner. */
  graceEndsAt: string | null;
  trialEndsAt: string | null;
  cancelAtPeriodEnd: boolean;
  /** Whether this actor may change the plan (billing or dealer admin). */
  canManage: boolean;
};

/** The visible report counter; null for accounts that see nothing of billing (customers). */
export async function getAllowanceSummary({
  actor,
}: {
  actor: TActor;
}): Promise<TAllowanceSummary | null> {
  if (!can(actor, "billing:read")) return null;
  const db = getDb();
  const [row] = await db
    .select({ account: billingAccounts, plan: billingPlans })
    .from(billingAccounts)
    .leftJoin(billingPlans, eq(billingPlans.key, billingAccounts.planKey))
    .where(eq(billingAccounts.dealershipId, actor.dealershipId));
  const now = new Date();
  const account = row?.account;
  const plan = row?.plan ?? null;
  const status: TBillingStatus = account?.status ?? "none";
  const period = allowancePeriod({
    status,
    trialStartedAt: account?.trialStartedAt ?? null,
    trialEndsAt: account?.trialEndsAt ?? null,
    now,
  });
  const used = account
    ? await countUsedInPeriod(db, {
        dealershipId: actor.dealershipId,
        status,
        planKey: account.planKey,
        period,
      })
    : 0;
  const decision = decideAllowance({
    status,
    plan,
    trialStartedAt: account?.trialStartedAt ?? null,
    trialEndsAt: account?.trialEndsAt ?? null,
    currentPeriodEnd: account?.currentPeriodEnd ?? null,
    pastDueSince: account?.pastDueSince ?? null,
    packCredits: account?.packCredits ?? 0,
    usedInPeriod: used,
    now,
  });
  return {
    planKey: plan?.key ?? null,
    planName: plan?.name ?? null,
    planKind: plan?.kind ?? null,
    state: status,
    used,
    included: plan && plan.kind !== "pack" ? plan.includedReports : null,
    packCredits: account?.packCredits ?? 0,
    periodStart: period.start.toISOString(),
    periodEnd: period.end.toISOString(),
    blocked: decision.ok
      ? null
      : { code: decision.code, message: BLOCK_MESSAGES[decision.code], billingHref: BILLING_HREF },
    graceEndsAt:
      status === "past_due" && account?.pastDueSince
        ? graceEndsAt(account.pastDueSince).toISOString()
        : null,
    trialEndsAt: account?.trialEndsAt?.toISOString() ?? null,
    cancelAtPeriodEnd: account?.cancelAtPeriodEnd ?? false,
    canManage: can(actor, "billing:manage"),
  };
}
