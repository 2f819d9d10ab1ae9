import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { treadReadingPhotos, treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { loadMachine } from "@/features/calibration/server/load-machine";
import { notFound } from "@/features/calibration/server/errors";

/** A reading's photo, for whoever may read the machine. */
export async function getReadingPhoto({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}) {
  const [row] = await db
    .select({ photo: treadReadingPhotos, machineId: treadReadings.machineId })
    .from(treadReadingPhotos)
    .innerJoin(treadReadings, eq(treadReadings.id, treadReadingPhotos.readingId))
    .where(
      and(eq(treadReadingPhotos.id, id), eq(treadReadingPhotos.dealershipId, actor.dealershipId)),
    );
  if (!row) throw notFound("photo");
  await loadMachine(db, actor, row.machineId, "read");
  return { contentType: row.photo.contentType, bytes: row.photo.bytes };
}
