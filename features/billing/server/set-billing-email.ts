import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import type { Db } from "@/db/client";
import { billingAccounts } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { loadAccount } from "@/features/billing/server/load-account";
import {
  NOT_BILLING_ADMIN,
  withProviderErrors,
  type TBillingResult,
} from "@/features/billing/server/billing-result";
import type { TBillingProvider } from "@/features/billing/server/stripe";

export const ZBillingEmail = z
  .string()
  .trim()
  .email("Enter an e-mail address such as accounts@yourdealership.example.");

/** Where receipts and payment warnings go; the provider's customer gets the same address. */
export async function setBillingEmail(opts: {
  db: Db;
  provider: TBillingProvider;
  actor: TActor;
  email: string;
}): Promise<TBillingResult> {
  const { db, provider, actor } = opts;
  if (!can(actor, "billing:manage")) return NOT_BILLING_ADMIN;
  const parsed = ZBillingEmail.safeParse(opts.email);
  if (!parsed.success)
    return { ok: false, code: "invalid_input", message: parsed.error.issues[0]!.message };
  const { account } = await loadAccount(db, actor.dealershipId);
  return withProviderErrors(async () => {
    // Provider first: if it refuses, our copy keeps the old address.
    if (account.providerCustomerId)
      await provider.updateCustomerEmail(account.providerCustomerId, parsed.data);
    await db
      .update(billingAccounts)
      .set({ billingEmail: parsed.data, updatedAt: new Date() })
      .where(eq(billingAccounts.dealershipId, actor.dealershipId));
    return { ok: true };
  });
}
