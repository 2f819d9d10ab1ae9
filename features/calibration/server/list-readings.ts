import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { treadReadingPhotos, treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { loadMachine } from "@/features/calibration/server/load-machine";
import type { TReadingDto } from "@/features/calibration/schemas/reading";
import { toReadingDto } from "@/features/calibration/server/reading-dto";

/** Every reading of a machine, oldest first, with the ids of their photos. */
export async function listReadings({
  db,
  actor,
  machineId,
}: {
  db: DbOrTx;
  actor: TActor;
  machineId: string;
}): Promise<TReadingDto[]> {
  const { machine } = await loadMachine(db, actor, machineId, "read");
  const rows = await db
    .select()
    .from(treadReadings)
    .where(eq(treadReadings.machineId, machine.id))
    .orderBy(
      asc(treadReadings.hourMeter),
      asc(treadReadings.measuredOn),
      asc(treadReadings.createdAt),
    );
  const photos = rows.length
    ? await db
        .select({ id: treadReadingPhotos.id, readingId: treadReadingPhotos.readingId })
        .from(treadReadingPhotos)
        .where(
          inArray(
            treadReadingPhotos.readingId,
            rows.map((r) => r.id),
          ),
        )
    : [];
  return rows.map((r) =>
    toReadingDto(
      r,
      photos.filter((p) => p.readingId === r.id).map((p) => p.id),
    ),
  );
}
