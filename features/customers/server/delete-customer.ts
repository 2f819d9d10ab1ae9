import "server-only";
import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, dutyCycles, estimates, machines, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ApiError } from "@/features/platform";
import { loadCustomer } from "@/features/customers/server/get-customer";

export type TDeleteImpact = Record<string, number>;

async function countWhere(
  db: DbOrTx,
  table: typeof sites | typeof machines | typeof estimates | typeof dutyCycles,
  customerId: string,
) {
  const [r] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(table)
    .where(eq(table.customerId, customerId));
  return r?.n ?? 0;
}

/**
 * Deletes a customer with everything that belongs to it (sites, machines, duty cycles, estimates),
 * in one transaction. Without `confirm` it refuses with 409 and says what would go.
 */
export async function deleteCustomer({
  db,
  actor,
  id,
  confirm,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  confirm: boolean;
}): Promise<{ deleted: true; impact: TDeleteImpact }> {
  const customer = await loadCustomer(db, actor, id, "write");
  const impact: TDeleteImpact = {
    sites: await countWhere(db, sites, id),
    machines: await countWhere(db, machines, id),
    dutyCycles: await countWhere(db, dutyCycles, id),
    estimates: await countWhere(db, estimates, id),
  };
  if (!confirm) {
    throw new ApiError(
      409,
      "confirm_required",
      `Deleting ${customer.name} also deletes ${impact.sites} sites, ${impact.machines} machines, ${impact.dutyCycles} duty cycles and ${impact.estimates} estimates. Repeat the request with ?confirm=true to go ahead.`,
      undefined,
      { impact },
    );
  }
  // Foreign keys cascade from the customer to its sites, machines, duty cycles and estimates.
  await db.transaction(async (tx) => {
    await tx.delete(estimates).where(eq(estimates.customerId, id));
    await tx.delete(customers).where(eq(customers.id, id));
  });
  return { deleted: true, impact };
}
