import "server-only";
import {
  compareOptions,
  ENGINE_VERSION,
  sweepParameter,
  type TDutyCycleInput,
  type TEstimateOptions,
  type TMachineInput,
  type TOptionSpec,
  type TSweepSpec,
} from "@/lib/scrub";
import { ApiError } from "@/features/platform";
import type { TCalibrationRecord } from "@/lib/calibration";

/**
 * What a study freezes: the estimate's engine inputs (with its engine options, so a study of a
 * calibrated estimate runs calibrated too) plus the study's own request.
 */
type TFrozenEngineInputs = {
  machine: TMachineInput;
  dutyCycle: TDutyCycleInput;
  engineOptions?: TEstimateOptions;
  /** The source estimate's calibration record, when it was a calibrated estimate. */
  calibration?: TCalibrationRecord | null;
};
export type TStudyInputs =
  | (TFrozenEngineInputs & { kind: "comparison"; options: TOptionSpec[]; hours: number })
  | (TFrozenEngineInputs & { kind: "sweep"; sweep: TSweepSpec });

/** Runs the engine for frozen inputs; the engine's refusals become a 422 that says what to fix. */
export function runStudy(inputs: TStudyInputs) {
  try {
    if (inputs.kind === "comparison") {
      const result = compareOptions(inputs.machine, inputs.dutyCycle, inputs.options, {
        ...inputs.engineOptions,
        hours: inputs.hours,
      });
      const costs = result.options.filter((o) => o.feasible).map((o) => o.costPerHour);
      return {
        engineVersion: ENGINE_VERSION,
        result,
        currentCostPerHour: finite(result.current.costPerHour),
        bestCostPerHour: costs.length > 0 ? finite(Math.min(...costs)) : null,
      };
    }
    const result = sweepParameter(
      inputs.machine,
      inputs.dutyCycle,
      inputs.sweep,
      inputs.engineOptions,
    );
    return {
      engineVersion: ENGINE_VERSION,
      result,
      currentCostPerHour: finite(result.current.costPerHour),
      bestCostPerHour: result.best ? finite(result.best.costPerHour) : null,
    };
  } catch (e) {
    throw new ApiError(
      422,
      "study_failed",
      `The engine could not run this ${inputs.kind}: ${(e as Error).message}`,
    );
  }
}

const finite = (n: number) => (Number.isFinite(n) ? n : null);
