import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/calibration/server/respond";
import { getMachineCalibration } from "@/features/calibration/server/get-machine-calibration";
import { createCalibratedEstimate } from "@/features/calibration/server/create-calibrated-estimate";

export const GET = withActor(({ actor, params }) =>
  respond(() =>
    getMachineCalibration({ db: getDb(), actor, machineId: pathId(params.id, "machine") }),
  ),
);

/** Stores a calibrated run of the machine's latest estimate. */
export const POST = withActor(({ actor, params }) =>
  respond(
    () => createCalibratedEstimate({ db: getDb(), actor, machineId: pathId(params.id, "machine") }),
    201,
  ),
);
