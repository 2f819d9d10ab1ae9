import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { readScope } from "@/lib/authz/policy";

/** The name of the customer record a customer account belongs to, for the portal's heading. */
export async function getCustomerName(db: DbOrTx, actor: TActor): Promise<string> {
  const { dealershipId, customerId } = readScope(actor);
  if (!customerId) return "Your account";
  const [row] = await db
    .select({ name: customers.name })
    .from(customers)
    .where(and(eq(customers.id, customerId), eq(customers.dealershipId, dealershipId)));
  return row?.name ?? "Your account";
}
