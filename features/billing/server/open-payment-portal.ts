import "server-only";
import type { Db } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ensureProviderCustomer } from "@/features/billing/server/load-account";
import {
  NOT_BILLING_ADMIN,
  withProviderErrors,
  type TBillingResult,
} from "@/features/billing/server/billing-result";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/** A short-lived link to the provider's page for the card on file and past invoices. */
export async function openPaymentPortal(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
  appUrl: string;
}): Promise<TBillingResult<{ url: string }>> {
  const { db, provider, actor } = opts;
  if (!can(actor, "billing:manage")) return NOT_BILLING_ADMIN;
  return withProviderErrors<{ url: string }>(async () => {
    const customerId = await ensureProviderCustomer(db, provider, actor.dealershipId);
    const session = await provider.createPortalSession(customerId, `${opts.appUrl}/billing`);
    return { ok: true, value: { url: session.url } };
  });
}
