import "server-only";
import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingAccounts, dealerships } from "@/db/schema";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/** The dealership's billing account, created (with no plan) when missing. */
export async function loadAccount(db: Db, dealershipId: string) {
  await db.insert(billingAccounts).values({ dealershipId }).onConflictDoNothing();
  const [row] = await db
    .select({ account: billingAccounts, dealershipName: dealerships.name })
    .from(billingAccounts)
    .innerJoin(dealerships, eq(dealerships.id, billingAccounts.dealershipId))
    .where(eq(billingAccounts.dealershipId, dealershipId));
  return row!;
}

/** The provider customer for the dealership, created once (idempotency key per dealership). */
export async function ensureProviderCustomer(
  db: Db,
  provider: TBillingProvider,
  dealershipId: string,
): Promise<string> {
  const { account, dealershipName } = await loadAccount(db, dealershipId);
  if (account.providerCustomerId) return account.providerCustomerId;
  const customer = await provider.createCustomer({
    dealershipId,
    name: dealershipName,
    email: account.billingEmail,
  });
  await db
    .update(billingAccounts)
    .set({ providerCustomerId: customer.id })
    .where(eq(billingAccounts.dealershipId, dealershipId));
  return customer.id;
}
