import "server-only";
import { asc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingPlans, type TBillingPlan } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { loadAccount } from "@/features/billing/server/load-account";
import { BillingProviderError, type TBillingProvider } from "@/features/billing/server/stripe";

export type TInvoiceRow = {
  id: string;
  number: string;
  createdAt: string;
  amountMinor: number;
  currency: string;
  status: string;
  pdfUrl: string | null;
};

export type TBillingOverview = {
  plans: TBillingPlan[];
  billingEmail: string | null;
  hasSubscription: boolean;
  currentPeriodEnd: string | null;
  card: { brand: string; last4: string; expMonth: number; expYear: number } | null;
  invoices: TInvoiceRow[];
  /** Set when the provider could not be reached: the page still shows our own state. */
  providerProblem: string | null;
};

/** Everything the billing admin's page shows beyond the counter; null for other roles. */
export async function getBillingOverview(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
}): Promise<TBillingOverview | null> {
  const { db, provider, actor } = opts;
  if (!can(actor, "billing:manage")) return null;
  const { account } = await loadAccount(db, actor.dealershipId);
  const plans = await db
    .select()
    .from(billingPlans)
    .where(eq(billingPlans.active, true))
    .orderBy(asc(billingPlans.sortOrder));
  const overview: TBillingOverview = {
    plans,
    billingEmail: account.billingEmail,
    hasSubscription: Boolean(account.providerSubscriptionId) && account.status !== "cancelled",
    currentPeriodEnd: account.currentPeriodEnd?.toISOString() ?? null,
    card: null,
    invoices: [],
    providerProblem: null,
  };
  if (!account.providerCustomerId) return overview;
  try {
    const [cards, invoices] = await Promise.all([
      provider.listCards(account.providerCustomerId),
      provider.listInvoices(account.providerCustomerId),
    ]);
    const card = cards.data[0]?.card;
    if (card)
      overview.card = {
        brand: card.brand,
        last4: card.last4,
        expMonth: card.exp_month,
        expYear: card.exp_year,
      };
    overview.invoices = invoices.data.map((i) => ({
      id: i.id,
      number: i.number ?? i.id,
      createdAt: new Date(i.created * 1000).toISOString(),
      amountMinor: i.total,
      currency: i.currency,
      status: i.status ?? "draft",
      pdfUrl: i.invoice_pdf ?? null,
    }));
  } catch (error) {
    if (!(error instanceof BillingProviderError)) throw error;
    overview.providerProblem = error.message;
  }
  return overview;
}
