import "server-only";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZCustomerInput, type TCustomerDto } from "@/features/customers/schemas/customer";
import { assertMayWrite } from "@/features/platform";
import { parseOrThrow } from "@/features/platform";
import { toCustomerDto } from "@/features/customers/server/customer-dto";

export async function createCustomer({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}): Promise<TCustomerDto> {
  assertMayWrite(actor, "customer");
  const values = parseOrThrow(ZCustomerInput, input);
  const [row] = await db
    .insert(customers)
    .values({ ...values, dealershipId: actor.dealershipId })
    .returning();
  if (!row) throw new Error("insert returned no customer");
  return toCustomerDto(row);
}
