import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { invalidReference, ApiError } from "@/features/platform";
import { loadCustomer } from "@/features/customers/server/get-customer";

/** Checks a customerId given in a body; a missing one is a field error (400), not a 404 of the request. */
export async function resolveCustomerField(db: DbOrTx, actor: TActor, customerId: string) {
  try {
    return await loadCustomer(db, actor, customerId, "write");
  } catch (e) {
    if (e instanceof ApiError && e.status === 404)
      throw invalidReference("customerId", "No customer with that id in your dealership.");
    throw e;
  }
}
