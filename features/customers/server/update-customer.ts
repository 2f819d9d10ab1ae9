import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZCustomerPatch, type TCustomerDto } from "@/features/customers/schemas/customer";
import { parseOrThrow } from "@/features/platform";
import { loadCustomer } from "@/features/customers/server/get-customer";
import { toCustomerDto } from "@/features/customers/server/customer-dto";

export async function updateCustomer({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TCustomerDto> {
  await loadCustomer(db, actor, id, "write");
  const patch = parseOrThrow(ZCustomerPatch, input);
  const [row] = await db
    .update(customers)
    .set({ ...patch, updatedAt: new Date() })
    .where(eq(customers.id, id))
    .returning();
  if (!row) throw new Error("update returned no customer");
  return toCustomerDto(row);
}
