import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { loadMachine } from "@/features/calibration/server/load-machine";
import { notFound } from "@/features/calibration/server/errors";

/** Deletes one reading (and its photos); the machine must be the actor's to change. */
export async function deleteReading({ db, actor, id }: { db: DbOrTx; actor: TActor; id: string }) {
  const [row] = await db
    .select({ machineId: treadReadings.machineId })
    .from(treadReadings)
    .where(and(eq(treadReadings.id, id), eq(treadReadings.dealershipId, actor.dealershipId)));
  if (!row) throw notFound("reading");
  await loadMachine(db, actor, row.machineId, "write");
  await db.delete(treadReadings).where(eq(treadReadings.id, id));
  return { deleted: true };
}
