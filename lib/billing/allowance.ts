/**
 * Whether a dealership may issue one more report, from its billing state. Pure: the server
 * reads the state under a row lock, asks here, then records the use in the same transaction.
 */
export type TAllowanceState =
  "none" | "trialing" | "active" | "past_due" | "cancelled" | "incomplete";

export type TAllowancePlan = {
  key: string;
  name: string;
  kind: "trial" | "pack" | "monthly" | "annual";
  includedReports: number;
  overageMinor: number | null;
};

export type TAllowanceInput = {
  status: TAllowanceState;
  plan: TAllowancePlan | null;
  trialStartedAt: Date | null;
  trialEndsAt: Date | null;
  currentPeriodEnd: Date | null;
  pastDueSince: Date | null;
  packCredits: number;
  /** Reports already counted in the period `allowancePeriod` returns. */
  usedInPeriod: number;
  now: Date;
};

export type TBlockCode = "no_plan" | "quota_reached" | "cancelled" | "past_due_expired";

export type TAllowanceDecision =
  { ok: true; source: "included" | "pack" | "overage" } | { ok: false; code: TBlockCode };

/** Days a past-due account keeps issuing reports while the payment is sorted out. */
export const PAST_DUE_GRACE_DAYS = 7;
const DAY_MS = 86_400_000;

/** The first instant of the UTC calendar month holding `now`, and of the next one. */
export function calendarMonth(now: Date): { start: Date; end: Date } {
  const start = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), 1));
  const end = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() + 1, 1));
  return { start, end };
}

/** The period usage is counted over: the whole trial, else the calendar month. */
export function allowancePeriod(input: {
  status: TAllowanceState;
  trialStartedAt: Date | null;
  trialEndsAt: Date | null;
  now: Date;
}): { start: Date; end: Date } {
  if (input.status === "trialing" && input.trialStartedAt && input.trialEndsAt)
    return { start: input.trialStartedAt, end: input.trialEndsAt };
  return calendarMonth(input.now);
}

export function graceEndsAt(pastDueSince: Date): Date {
  return new Date(pastDueSince.getTime() + PAST_DUE_GRACE_DAYS * DAY_MS);
}

function fromCredits(packCredits: number, otherwise: TBlockCode): TAllowanceDecision {
  return packCredits > 0 ? { ok: true, source: "pack" } : { ok: false, code: otherwise };
}

export function decideAllowance(input: TAllowanceInput): TAllowanceDecision {
  const { status, plan, now } = input;
  if (status === "trialing") {
    const live = input.trialEndsAt !== null && now < input.trialEndsAt;
    if (live && plan && input.usedInPeriod < plan.includedReports)
      return { ok: true, source: "included" };
    return fromCredits(input.packCredits, live ? "quota_reached" : "no_plan");
  }
  if (status === "cancelled") return fromCredits(input.packCredits, "cancelled");
  if (status === "none" || status === "incomplete" || !plan || plan.kind === "pack")
    return fromCredits(input.packCredits, "no_plan");
  if (status === "past_due") {
    const since = input.pastDueSince ?? now;
    if (now >= graceEndsAt(since)) return { ok: false, code: "past_due_expired" };
  }
  if (input.usedInPeriod < plan.includedReports) return { ok: true, source: "included" };
  if (input.packCredits > 0) return { ok: true, source: "pack" };
  if (plan.overageMinor !== null) return { ok: true, source: "overage" };
  return { ok: false, code: "quota_reached" };
}

/** Words an estimator understands, for each reason a report is blocked. */
export const BLOCK_MESSAGES: Record<TBlockCode, string> = {
  no_plan:
    "Your dealership has no active report plan, so new quote reports cannot be issued. Ask your billing admin to choose a plan.",
  quota_reached:
    "Your dealership has used every quote report included in its plan for this period. Ask your billing admin to buy a report bundle or change plan.",
  cancelled:
    "Your dealership's report plan was cancelled. Reports already issued stay readable; ask your billing admin to restart the plan to issue new ones.",
  past_due_expired:
    "Your dealership's last payment failed and the grace period has ended. Ask your billing admin to update the payment method.",
};
