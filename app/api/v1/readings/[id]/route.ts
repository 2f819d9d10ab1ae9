import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/calibration/server/respond";
import { deleteReading } from "@/features/calibration/server/delete-reading";

export const DELETE = withActor(({ actor, params }) =>
  respond(() => deleteReading({ db: getDb(), actor, id: pathId(params.id, "reading") })),
);
