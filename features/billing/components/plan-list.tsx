import type { TBillingPlan } from "@/db/schema";
import { formatMoney } from "@/lib/billing/money";
import type { TBillingActionState } from "@/features/billing/schemas/billing-action";
import { BillingActionForm } from "@/features/billing/components/billing-action-form";

type TAction = (
  prev: TBillingActionState | undefined,
  form: FormData,
) => Promise<TBillingActionState>;

const PER: Record<TBillingPlan["kind"], string> = {
  trial: "",
  pack: "one-off",
  monthly: "per month",
  annual: "per year",
};

/** The plans on sale, each with the action that fits the dealership's current plan. */
export function PlanList({
  plans,
  currentPlanKey,
  hasSubscription,
  subscribe,
  switchPlan,
}: {
  plans: TBillingPlan[];
  currentPlanKey: string | null;
  hasSubscription: boolean;
  subscribe: TAction;
  switchPlan: TAction;
}) {
  return (
    <ul className="grid gap-3 sm:grid-cols-3">
      {plans
        .filter((p) => p.kind !== "trial")
        .map((plan) => {
          const current = plan.key === currentPlanKey && hasSubscription;
          return (
            <li
              key={plan.key}
              className="flex flex-col gap-2 rounded-md border border-ink-200 p-3"
              aria-label={plan.name}
            >
              <h3 className="font-medium text-ink-900">{plan.name}</h3>
              <p className="text-xl font-bold">
                {formatMoney(plan.priceMinor, plan.currency)}{" "}
                <span className="text-sm font-normal text-ink-600">{PER[plan.kind]}</span>
              </p>
              <p className="text-sm text-ink-700">{plan.description}</p>
              {current ? (
                <p className="text-sm font-medium text-furrow-800">Current plan</p>
              ) : plan.kind === "pack" || !hasSubscription ? (
                <BillingActionForm
                  action={subscribe}
                  fields={{ planKey: plan.key }}
                  label={plan.kind === "pack" ? "Buy this bundle" : "Subscribe"}
                />
              ) : (
                <BillingActionForm
                  action={switchPlan}
                  fields={{ planKey: plan.key }}
                  label="Switch to this plan"
                  variant="secondary"
                />
              )}
            </li>
          );
        })}
    </ul>
  );
}
