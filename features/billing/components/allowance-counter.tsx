import { Caution } from "@/lib/ui/caution";
import type { TAllowanceSummary } from "@/features/billing/server/get-allowance-summary";

const STATE_LABELS: Record<TAllowanceSummary["state"], string> = {
  none: "No plan",
  trialing: "Trial",
  active: "Active",
  past_due: "Payment overdue",
  cancelled: "Cancelled",
  incomplete: "Waiting for first payment",
};

const day = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", {
    day: "numeric",
    month: "short",
    year: "numeric",
    timeZone: "UTC",
  });

/** The report counter every staff role sees, with why issuing is blocked when it is. */
export function AllowanceCounter({ summary }: { summary: TAllowanceSummary }) {
  const periodLabel =
    summary.state === "trialing"
      ? `trial, until ${day(summary.periodEnd)}`
      : `${day(summary.periodStart)} – ${day(new Date(new Date(summary.periodEnd).getTime() - 1).toISOString())}`;
  return (
    <div className="flex flex-col gap-3" data-testid="allowance-counter">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <p className="text-3xl font-bold text-ink-900" aria-label="Quote reports used">
          {summary.used}
          {summary.included !== null ? (
            <span className="text-ink-500"> / {summary.included}</span>
          ) : null}
        </p>
        <p className="text-sm text-ink-700">
          quote reports used ({periodLabel})
          {summary.packCredits > 0 ? ` · ${summary.packCredits} bundle reports left` : ""}
        </p>
      </div>
      <p className="text-sm text-ink-700">
        Plan: <strong>{summary.planName ?? "none"}</strong> · {STATE_LABELS[summary.state]}
        {summary.cancelAtPeriodEnd ? " · stops at the end of this billing period" : ""}
      </p>
      {summary.graceEndsAt && !summary.blocked ? (
        <Caution title="The last payment failed">
          Reports can still be issued until {day(summary.graceEndsAt)}.{" "}
          {summary.canManage
            ? "Update the card below."
            : "Ask your billing admin to update the card."}
        </Caution>
      ) : null}
      {summary.blocked ? (
        <Caution title="New quote reports are blocked" tone="danger">
          {summary.canManage
            ? summary.blocked.message.replace(/ Ask your billing admin.*$/, "")
            : summary.blocked.message}
        </Caution>
      ) : null}
    </div>
  );
}
