import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZCustomerPatch, type TCustomerDto } from "@/features/workspace/schemas/customer";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { loadCustomer } from "@/features/workspace/server/get-customer";
import { toCustomerDto } from "@/features/workspace/server/customer-dto";

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
