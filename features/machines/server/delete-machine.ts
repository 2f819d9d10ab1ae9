import "server-only";
import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycles, estimates, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ApiError } from "@/features/platform";
import { loadMachine } from "@/features/machines/server/get-machine";

/**
 * Deletes a machine and its estimates (they cannot be reproduced without it). Duty cycles recorded
 * on it stay with the customer, unlinked; copies made from a template keep their own specs.
 */
export async function deleteMachine({
  db,
  actor,
  id,
  confirm,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  confirm: boolean;
}): Promise<{ deleted: true; impact: Record<string, number> }> {
  const { machine } = await loadMachine(db, actor, id, "write");
  const [est] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(estimates)
    .where(eq(estimates.machineId, id));
  const [dc] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(dutyCycles)
    .where(eq(dutyCycles.machineId, id));
  const impact = { estimates: est?.n ?? 0, dutyCyclesUnlinked: dc?.n ?? 0 };
  if (!confirm)
    throw new ApiError(
      409,
      "confirm_required",
      `Deleting ${machine.name} also deletes its ${impact.estimates} estimates; ${impact.dutyCyclesUnlinked} duty cycles stay with the customer. Repeat the request with ?confirm=true to go ahead.`,
      undefined,
      { impact },
    );
  await db.delete(machines).where(eq(machines.id, id));
  return { deleted: true, impact };
}
