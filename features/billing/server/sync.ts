// Brings our copy of a dealership's billing state in line with the provider's current objects.
// Every path re-reads the object from the API, so events may arrive late, twice or out of order.
// Runs in the worker and the app, so no "server-only" marker.
import { eq, sql } from "drizzle-orm";
import type Stripe from "stripe";
import type { Db } from "@/db/client";
import { billingAccounts, billingPackGrants, billingPlans, type TBillingStatus } from "@/db/schema";
import { graceEndsAt } from "@/lib/billing/allowance";
import type { TBillingDeps } from "@/features/billing/server/deps";
import { sendPaymentFailedMail, sendReceiptMail } from "@/features/billing/server/billing-mails";

const STATUS: Record<Stripe.Subscription.Status, TBillingStatus> = {
  active: "active",
  trialing: "active",
  past_due: "past_due",
  unpaid: "past_due",
  canceled: "cancelled",
  incomplete: "incomplete",
  incomplete_expired: "cancelled",
  paused: "cancelled",
};

const idOf = (v: string | { id: string } | null | undefined) =>
  typeof v === "string" ? v : (v?.id ?? null);

async function accountByCustomer(db: Db, customerId: string) {
  const [account] = await db
    .select()
    .from(billingAccounts)
    .where(eq(billingAccounts.providerCustomerId, customerId));
  return account ?? null;
}

/** Applies the subscription's current state; a superseded subscription changes nothing. */
export async function syncSubscription(
  { db, provider }: Pick<TBillingDeps, "db" | "provider">,
  subscriptionId: string,
): Promise<void> {
  const sub = await provider.retrieveSubscription(subscriptionId);
  const account = await accountByCustomer(db, idOf(sub.customer)!);
  if (!account) return;
  const status = STATUS[sub.status];
  // An old subscription's late event must not undo the current one.
  if (
    account.providerSubscriptionId &&
    account.providerSubscriptionId !== sub.id &&
    status === "cancelled"
  )
    return;
  const item = sub.items.data[0];
  const lookupKey = item?.price.lookup_key ?? null;
  const [plan] = lookupKey
    ? await db.select().from(billingPlans).where(eq(billingPlans.key, lookupKey))
    : [];
  const now = new Date();
  await db
    .update(billingAccounts)
    .set({
      status,
      providerSubscriptionId: sub.id,
      planKey: plan?.key ?? account.planKey,
      currentPeriodStart: item ? new Date(item.current_period_start * 1000) : null,
      currentPeriodEnd: item ? new Date(item.current_period_end * 1000) : null,
      cancelAtPeriodEnd: sub.cancel_at_period_end,
      pastDueSince: status === "past_due" ? (account.pastDueSince ?? now) : null,
      // A paid plan replaces the trial.
      ...(status === "active" ? { trialEndsAt: null, trialStartedAt: null } : {}),
      updatedAt: now,
    })
    .where(eq(billingAccounts.dealershipId, account.dealershipId));
}

/** A completed checkout: a subscription is applied, a pack credited once. */
export async function syncCheckoutSession(
  deps: Pick<TBillingDeps, "db" | "provider">,
  sessionId: string,
): Promise<"applied" | "not_paid" | "unknown"> {
  const { db, provider } = deps;
  const session = await provider.retrieveCheckoutSession(sessionId);
  const dealershipId = session.client_reference_id ?? session.metadata?.dealershipId;
  if (!dealershipId) return "unknown";
  if (session.status !== "complete" || session.payment_status !== "paid") return "not_paid";
  const customerId = idOf(session.customer);
  if (customerId) {
    await db
      .update(billingAccounts)
      .set({ providerCustomerId: customerId })
      .where(eq(billingAccounts.dealershipId, dealershipId));
  }
  if (session.mode === "subscription") {
    const subscriptionId = idOf(session.subscription);
    if (subscriptionId) await syncSubscription(deps, subscriptionId);
    return "applied";
  }
  const planKey = session.metadata?.planKey;
  if (!planKey) return "unknown";
  await db.transaction(async (tx) => {
    const [plan] = await tx.select().from(billingPlans).where(eq(billingPlans.key, planKey));
    if (!plan) return;
    const [grant] = await tx
      .insert(billingPackGrants)
      .values({
        checkoutSessionId: session.id,
        dealershipId,
        planKey,
        reports: plan.includedReports,
      })
      .onConflictDoNothing()
      .returning();
    if (!grant) return;
    await tx
      .update(billingAccounts)
      .set({
        packCredits: sql`${billingAccounts.packCredits} + ${grant.reports}`,
        updatedAt: new Date(),
      })
      .where(eq(billingAccounts.dealershipId, dealershipId));
  });
  return "applied";
}

function subscriptionOfInvoice(invoice: Stripe.Invoice): string | null {
  return idOf(invoice.parent?.subscription_details?.subscription);
}

/** Paid or failed invoice: re-read it, mail the billing admin, refresh the subscription. */
export async function syncInvoice(deps: TBillingDeps, invoiceId: string): Promise<void> {
  const { db, provider } = deps;
  const invoice = await provider.retrieveInvoice(invoiceId);
  const account = await accountByCustomer(db, idOf(invoice.customer)!);
  if (!account) return;
  const subscriptionId = subscriptionOfInvoice(invoice);
  if (subscriptionId) await syncSubscription(deps, subscriptionId);
  if (invoice.status === "paid") {
    await sendReceiptMail(deps, {
      dealershipId: account.dealershipId,
      invoiceId: invoice.id,
      number: invoice.number ?? invoice.id,
      amountMinor: invoice.amount_paid,
      currency: invoice.currency,
      pdfUrl: invoice.invoice_pdf ?? null,
    });
  } else if (invoice.status === "open" && invoice.amount_remaining > 0) {
    const [fresh] = await db
      .select()
      .from(billingAccounts)
      .where(eq(billingAccounts.dealershipId, account.dealershipId));
    await sendPaymentFailedMail(deps, {
      dealershipId: account.dealershipId,
      invoiceId: invoice.id,
      amountMinor: invoice.amount_remaining,
      currency: invoice.currency,
      graceEnds: graceEndsAt(fresh?.pastDueSince ?? new Date()),
    });
  }
}
