import "server-only";
import { and, eq, gt, lt } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { treadReadingPhotos, treadReadings } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { loadMachine } from "@/features/calibration/server/load-machine";
import {
  PHOTO_MAX_BYTES,
  PHOTOS_PER_READING,
  ZReadingCreate,
  type TReadingCreate,
  type TReadingDto,
} from "@/features/calibration/schemas/reading";
import { CalibrationError, parseOrThrow } from "@/features/calibration/server/errors";
import { sniffImage } from "@/features/calibration/server/sniff-image";
import { toReadingDto } from "@/features/calibration/server/reading-dto";

export type TPhotoUpload = { name: string; bytes: Uint8Array };

function checkPhotos(photos: readonly TPhotoUpload[]) {
  if (photos.length > PHOTOS_PER_READING)
    throw new CalibrationError(
      400,
      "invalid_input",
      `Attach at most ${PHOTOS_PER_READING} photos to one reading.`,
      {
        photos: [`At most ${PHOTOS_PER_READING} photos.`],
      },
    );
  return photos.map((p) => {
    const type = sniffImage(p.bytes);
    const problem = !type
      ? `${p.name} is not a JPEG or PNG picture.`
      : p.bytes.byteLength > PHOTO_MAX_BYTES
        ? `${p.name} is ${(p.bytes.byteLength / 1048576).toFixed(1)} MB; the limit is ${PHOTO_MAX_BYTES / 1048576} MB. Send a smaller photo.`
        : null;
    if (problem)
      throw new CalibrationError(400, "invalid_input", `Please fix the photos. ${problem}`, {
        photos: [problem],
      });
    return { contentType: type!, bytes: Buffer.from(p.bytes) };
  });
}

/** An hour meter only goes forward: a reading must not show fewer hours than an earlier date. */
async function checkHourMeter(db: DbOrTx, machineId: string, v: TReadingCreate) {
  const [earlierHigher] = await db
    .select({ on: treadReadings.measuredOn, hours: treadReadings.hourMeter })
    .from(treadReadings)
    .where(
      and(
        eq(treadReadings.machineId, machineId),
        lt(treadReadings.measuredOn, v.measuredOn),
        gt(treadReadings.hourMeter, v.hourMeter),
      ),
    )
    .limit(1);
  if (earlierHigher) {
    const message = `The hour meter read ${earlierHigher.hours} h on ${earlierHigher.on}, earlier than this reading: check the hours or the date.`;
    throw new CalibrationError(
      400,
      "invalid_input",
      `Please fix the input. hourMeter: ${message}`,
      {
        hourMeter: [message],
      },
    );
  }
}

/** Stores one reading or tyre change with its photos, all or nothing. */
export async function recordReading({
  db,
  actor,
  machineId,
  input,
  photos = [],
}: {
  db: DbOrTx;
  actor: TActor;
  machineId: string;
  input: unknown;
  photos?: readonly TPhotoUpload[];
}): Promise<TReadingDto> {
  const { machine } = await loadMachine(db, actor, machineId, "write");
  const values = parseOrThrow(ZReadingCreate, input);
  const checked = checkPhotos(photos);
  await checkHourMeter(db, machine.id, values);
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(treadReadings)
      .values({
        ...values,
        depthInner: values.depthInner ?? null,
        depthOuter: values.depthOuter ?? null,
        designation: values.designation || null,
        machineId: machine.id,
        dealershipId: actor.dealershipId,
        createdById: actor.userId,
      })
      .returning();
    const ids = checked.length
      ? await tx
          .insert(treadReadingPhotos)
          .values(
            checked.map((p) => ({
              ...p,
              byteSize: p.bytes.byteLength,
              readingId: row!.id,
              dealershipId: actor.dealershipId,
            })),
          )
          .returning({ id: treadReadingPhotos.id })
      : [];
    return toReadingDto(
      row!,
      ids.map((i) => i.id),
    );
  });
}
