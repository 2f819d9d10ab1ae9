import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/calibration/server/respond";
import { listReadings } from "@/features/calibration/server/list-readings";
import { recordReading, type TPhotoUpload } from "@/features/calibration/server/record-reading";
import { CalibrationError } from "@/features/calibration/server/errors";

export const GET = withActor(({ actor, params }) =>
  respond(() => listReadings({ db: getDb(), actor, machineId: pathId(params.id, "machine") })),
);

/** JSON, or multipart with a `reading` JSON field and `photos` files (from the phone form). */
async function readReading(req: Request): Promise<{ input: unknown; photos: TPhotoUpload[] }> {
  if (!(req.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    return { input: await readJson(req), photos: [] };
  }
  const form = await req.formData();
  let input: unknown;
  try {
    input = JSON.parse(String(form.get("reading") ?? "{}"));
  } catch {
    throw new CalibrationError(400, "invalid_json", "The reading field is not valid JSON.");
  }
  const photos: TPhotoUpload[] = [];
  for (const f of form.getAll("photos")) {
    if (typeof f === "string" || f.size === 0) continue;
    photos.push({ name: f.name || "photo", bytes: new Uint8Array(await f.arrayBuffer()) });
  }
  return { input, photos };
}

export const POST = withActor(({ req, actor, params }) =>
  respond(async () => {
    const machineId = pathId(params.id, "machine");
    const { input, photos } = await readReading(req);
    return recordReading({ db: getDb(), actor, machineId, input, photos });
  }, 201),
);
