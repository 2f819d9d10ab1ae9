import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZMachineRecordPatch, type TMachineDto } from "@/features/machines/schemas/machine";
import { parseOrThrow } from "@/features/platform";
import { loadMachine } from "@/features/machines/server/get-machine";
import { resolveCustomerField } from "@/features/customers";
import { toMachineDto } from "@/features/machines/server/machine-dto";

/** Updates a machine; a changed spec bumps its version so stored estimates stay traceable. */
export async function updateMachine({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TMachineDto> {
  const current = await loadMachine(db, actor, id, "write");
  const patch = parseOrThrow(ZMachineRecordPatch, input);
  let customerName = current.customerName;
  if (patch.customerId !== undefined) {
    customerName = patch.customerId
      ? (await resolveCustomerField(db, actor, patch.customerId)).name
      : null;
  }
  const row = await db.transaction(async (tx) => {
    const [updated] = await tx
      .update(machines)
      .set({
        ...(patch.customerId !== undefined ? { customerId: patch.customerId } : {}),
        ...(patch.kind ? { kind: patch.kind } : {}),
        ...(patch.spec
          ? {
              spec: patch.spec,
              name: patch.spec.name,
              layout: patch.spec.steering.layout,
              version: current.machine.version + 1,
            }
          : {}),
        updatedAt: new Date(),
      })
      .where(eq(machines.id, id))
      .returning();
    // A machine that changes hands takes its estimates along, so the new owner sees them and the
    // old one no longer does.
    if (updated && patch.customerId && patch.customerId !== current.machine.customerId)
      await tx
        .update(estimates)
        .set({ customerId: patch.customerId })
        .where(eq(estimates.machineId, id));
    return updated;
  });
  if (!row) throw new Error("update returned no machine");
  return toMachineDto(row, customerName);
}
