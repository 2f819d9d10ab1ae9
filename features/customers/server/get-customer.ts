import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TCustomerDto } from "@/features/customers/schemas/customer";
import { assertAccess } from "@/features/platform";
import { toCustomerDto } from "@/features/customers/server/customer-dto";

/** Loads a customer of the actor's dealership, checked for `action`. */
export async function loadCustomer(
  db: DbOrTx,
  actor: TActor,
  id: string,
  action: "read" | "write",
) {
  const [row] = await db
    .select()
    .from(customers)
    .where(and(eq(customers.id, id), eq(customers.dealershipId, actor.dealershipId)));
  assertAccess(actor, action, row && { ...row, customerId: row.id }, "customer");
  return row;
}

export async function getCustomer({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TCustomerDto> {
  return toCustomerDto(await loadCustomer(db, actor, id, "read"));
}
