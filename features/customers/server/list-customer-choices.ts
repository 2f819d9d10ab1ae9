import "server-only";
import { and, asc, eq, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { customerScope } from "@/features/platform";

/** Every customer the actor may see, as id and name for pickers. */
export async function listCustomerChoices({ db, actor }: { db: DbOrTx; actor: TActor }) {
  const filters: SQL[] = [eq(customers.dealershipId, actor.dealershipId)];
  const scope = customerScope(actor);
  if (scope) filters.push(eq(customers.id, scope));
  return db
    .select({ id: customers.id, name: customers.name })
    .from(customers)
    .where(and(...filters))
    .orderBy(asc(customers.name));
}
