import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getDb } from "@/db/client";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import { Input } from "@/lib/ui/input";
import { NotAllowed } from "@/features/auth/components/not-allowed";
import { getActor } from "@/features/auth/server/get-actor";
import { getAllowanceSummary } from "@/features/billing";
import { AllowanceCounter } from "@/features/billing/components/allowance-counter";
import { BillingActionForm } from "@/features/billing/components/billing-action-form";
import { InvoiceTable } from "@/features/billing/components/invoice-table";
import { PlanList } from "@/features/billing/components/plan-list";
import { confirmCheckout } from "@/features/billing/server/confirm-checkout";
import { getBillingOverview } from "@/features/billing/server/get-billing-overview";
import { billingProvider } from "@/features/billing/server/stripe";
import {
  cancelPlanAction,
  openPortalAction,
  resumePlanAction,
  setBillingEmailAction,
  startCheckoutAction,
  switchPlanAction,
} from "./actions";

export const metadata: Metadata = { title: "Report plan" };
export const dynamic = "force-dynamic";

type TSearch = Promise<{ checkout?: string; session_id?: string }>;

export default async function BillingPage({ searchParams }: { searchParams: TSearch }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in?callbackUrl=/billing");
  const db = getDb();
  const provider = billingProvider();
  const search = await searchParams;
  let checkoutNotice: { tone: "info" | "danger"; title: string; body: string } | null = null;
  if (search.checkout === "cancelled")
    checkoutNotice = {
      tone: "danger",
      title: "Checkout was not finished",
      body: "Nothing was charged and the plan is unchanged.",
    };
  if (search.checkout === "done" && search.session_id) {
    const confirmed = await confirmCheckout({ db, provider, actor, sessionId: search.session_id });
    checkoutNotice = !confirmed.ok
      ? { tone: "danger", title: "Payment not confirmed yet", body: confirmed.message }
      : confirmed.value.state === "applied"
        ? {
            tone: "info",
            title: "Payment received",
            body: "The new plan is active. A receipt is on its way by e-mail.",
          }
        : {
            tone: "danger",
            title: "Payment not completed",
            body: "Nothing was charged and the plan is unchanged.",
          };
  }
  const summary = await getAllowanceSummary({ actor });
  if (!summary) return <NotAllowed what="Billing" />;
  const overview = await getBillingOverview({ db, provider, actor });
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold text-ink-900">Report plan</h1>
      {checkoutNotice ? (
        <Caution title={checkoutNotice.title} tone={checkoutNotice.tone}>
          {checkoutNotice.body}
        </Caution>
      ) : null}
      <Card title="Quote reports">
        <AllowanceCounter summary={summary} />
        {!overview ? (
          <p className="mt-3 text-sm text-ink-700">
            Plans and payments are managed by your billing admin. Ask them if you need more reports.
          </p>
        ) : null}
      </Card>
      {overview ? (
        <>
          {overview.providerProblem ? (
            <Caution title="Payment details unavailable" tone="danger">
              {overview.providerProblem}
            </Caution>
          ) : null}
          <Card title="Plans">
            <PlanList
              plans={overview.plans}
              currentPlanKey={summary.planKey}
              hasSubscription={overview.hasSubscription}
              subscribe={startCheckoutAction}
              switchPlan={switchPlanAction}
            />
            {overview.hasSubscription ? (
              <div className="mt-4 border-t border-ink-100 pt-4">
                {summary.cancelAtPeriodEnd ? (
                  <BillingActionForm action={resumePlanAction} label="Keep the plan running" />
                ) : (
                  <BillingActionForm
                    action={cancelPlanAction}
                    label="Cancel at the end of this period"
                    variant="danger"
                  />
                )}
              </div>
            ) : null}
          </Card>
          <Card title="Payment method">
            <p className="mb-3 text-sm text-ink-700">
              {overview.card
                ? `Card ending ${overview.card.last4}, expires ${String(overview.card.expMonth).padStart(2, "0")}/${overview.card.expYear}.`
                : "No card on file yet; one is saved at the first checkout."}
            </p>
            <BillingActionForm
              action={openPortalAction}
              label="Change card or see invoices"
              variant="secondary"
            />
          </Card>
          <Card title="Invoices">
            <InvoiceTable invoices={overview.invoices} />
          </Card>
          <Card title="Billing e-mail">
            <BillingActionForm
              action={setBillingEmailAction}
              label="Save address"
              variant="secondary"
            >
              <label className="text-sm font-medium text-ink-800" htmlFor="billing-email">
                Receipts and payment warnings go to
              </label>
              <Input
                id="billing-email"
                name="email"
                type="email"
                defaultValue={overview.billingEmail ?? ""}
                required
              />
            </BillingActionForm>
          </Card>
        </>
      ) : null}
    </div>
  );
}
