import { ENGINE_COEFFICIENTS, type TEstimateOptions, type TMachineInput } from "@/lib/scrub";
import type { TMultipliers } from "./types";

/**
 * Maps fitted multipliers onto today's engine: the base term scales `baseWearPerKm`, the scrub
 * term scales the abradability (and any per-position wear coefficient the machine already
 * carries, which replaces abradability for that position). Both terms are linear in these, so
 * the engine's calibrated run equals the scaled split exactly.
 */
export function calibratedEngineInputs(
  machine: TMachineInput,
  options: TEstimateOptions,
  m: TMultipliers,
): { machine: TMachineInput; options: TEstimateOptions } {
  const wearCoefficients = machine.wearCoefficients
    ? Object.fromEntries(
        Object.entries(machine.wearCoefficients).map(([k, v]) => [
          k,
          typeof v === "number" ? v * m.scrub : v,
        ]),
      )
    : undefined;
  return {
    machine: wearCoefficients ? { ...machine, wearCoefficients } : machine,
    options: {
      ...options,
      // The engine takes only a positive abradability: a zero multiplier becomes a vanishing one.
      abradability:
        (options.abradability ?? ENGINE_COEFFICIENTS.ABRADABILITY) * Math.max(m.scrub, 1e-12),
      baseWearPerKm: (options.baseWearPerKm ?? ENGINE_COEFFICIENTS.BASE_WEAR_MM_PER_KM) * m.base,
    },
  };
}
