import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { ZCustomerListQuery } from "@/features/customers/schemas/customer-list-query";
import { listCustomers } from "@/features/customers/server/list-customers";

/** The customers a duty cycle may be filed under, for the upload and builder forms. */
export async function customerChoices(actor: TActor) {
  const page = await listCustomers({
    db: getDb(),
    actor,
    query: ZCustomerListQuery.parse({ pageSize: 100, sort: "name" }),
  });
  return page.items.map((c) => ({ id: c.id, name: c.name }));
}
