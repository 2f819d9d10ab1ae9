import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/calibration/server/respond";
import { importReadings } from "@/features/calibration/server/import-readings";

/** Body: `{ csv, depthUnit?, measuredBy? }`. */
export const POST = withActor(({ req, actor, params }) =>
  respond(
    async () =>
      importReadings({
        db: getDb(),
        actor,
        machineId: pathId(params.id, "machine"),
        input: await readJson(req),
      }),
    201,
  ),
);
