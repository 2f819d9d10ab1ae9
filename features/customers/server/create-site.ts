import "server-only";
import type { DbOrTx } from "@/db/client";
import { sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZSiteInput, type TSiteDto } from "@/features/customers/schemas/site";
import { parseOrThrow } from "@/features/platform";
import { resolveCustomerField } from "@/features/customers/server/resolve-customer";
import { assertMayWrite } from "@/features/platform";
import { toSiteDto } from "@/features/customers/server/site-dto";

export async function createSite({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}): Promise<TSiteDto> {
  // The role decides before the body: a read-only account gets 403, not a field error.
  assertMayWrite(actor, "site");
  const values = parseOrThrow(ZSiteInput, input);
  const customer = await resolveCustomerField(db, actor, values.customerId);
  const [row] = await db
    .insert(sites)
    .values({ ...values, dealershipId: actor.dealershipId })
    .returning();
  if (!row) throw new Error("insert returned no site");
  return toSiteDto(row, customer.name);
}
