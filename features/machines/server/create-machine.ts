import "server-only";
import type { DbOrTx } from "@/db/client";
import { machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZMachineRecordInput, type TMachineDto } from "@/features/machines/schemas/machine";
import { assertMayWrite } from "@/features/platform";
import { parseOrThrow } from "@/features/platform";
import { resolveCustomerField } from "@/features/customers";
import { toMachineDto } from "@/features/machines/server/machine-dto";

/** Creates a customer's machine, or a dealership template when customerId is null. */
export async function createMachine({
  db,
  actor,
  input,
  templateId = null,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
  templateId?: string | null;
}): Promise<TMachineDto> {
  assertMayWrite(actor, "machine");
  const values = parseOrThrow(ZMachineRecordInput, input);
  const customer = values.customerId
    ? await resolveCustomerField(db, actor, values.customerId)
    : null;
  const [row] = await db
    .insert(machines)
    .values({
      dealershipId: actor.dealershipId,
      customerId: values.customerId,
      name: values.spec.name,
      kind: values.kind,
      layout: values.spec.steering.layout,
      spec: values.spec,
      templateId,
    })
    .returning();
  if (!row) throw new Error("insert returned no machine");
  return toMachineDto(row, customer?.name ?? null);
}
