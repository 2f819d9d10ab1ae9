import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import type { TDutyCycleInput, TEstimateOptions, TMachineInput } from "@/lib/scrub";
import type { TCalibrationRecord } from "@/lib/calibration";
import type { TComparisonDto } from "../schemas/study";
import { getStudy } from "./get-study";
import type { TStudyInputs } from "./run-study";
import { toComparisonDto } from "./study-dto";

/**
 * A stored comparison the actor may read with the machine and duty cycle it froze (404
 * otherwise): what a quote report needs to rebuild every option's full result.
 */
export async function readComparisonSource(o: { db: DbOrTx; actor: TActor; id: string }): Promise<{
  comparison: TComparisonDto;
  machine: TMachineInput;
  dutyCycle: TDutyCycleInput;
  engineOptions: TEstimateOptions;
  calibration: TCalibrationRecord | null;
}> {
  const row = await getStudy({ ...o, kind: "comparison" });
  const inputs = row.inputs as Extract<TStudyInputs, { kind: "comparison" }>;
  return {
    comparison: toComparisonDto(row),
    machine: inputs.machine,
    dutyCycle: inputs.dutyCycle,
    engineOptions: inputs.engineOptions ?? {},
    calibration: inputs.calibration ?? null,
  };
}
