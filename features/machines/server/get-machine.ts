import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TMachineDto } from "@/features/machines/schemas/machine";
import { assertAccess } from "@/features/platform";
import { toMachineDto } from "@/features/machines/server/machine-dto";

export async function loadMachine(db: DbOrTx, actor: TActor, id: string, action: "read" | "write") {
  const [row] = await db
    .select({ machine: machines, customerName: customers.name })
    .from(machines)
    .leftJoin(customers, eq(customers.id, machines.customerId))
    .where(and(eq(machines.id, id), eq(machines.dealershipId, actor.dealershipId)));
  assertAccess(actor, action, row?.machine, "machine");
  return row!;
}

export async function getMachine({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TMachineDto> {
  const row = await loadMachine(db, actor, id, "read");
  return toMachineDto(row.machine, row.customerName);
}
