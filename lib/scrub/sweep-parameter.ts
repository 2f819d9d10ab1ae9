import { z } from "zod";
import { estimate } from "./estimate";
import {
  applyChanges,
  parameterValue,
  ZSweepParameter,
  type TSweepParameter,
} from "./machine-changes";
import { parameterCautions } from "./option-cautions";
import type {
  TCaution,
  TDutyCycleInput,
  TEstimateOptions,
  TEstimateResult,
  TMachineInput,
  TWarning,
} from "./schemas";

export const ZSweepSpec = z.object({
  parameter: ZSweepParameter,
  /** Values to try, in the order the result keeps (1–201 of them). */
  values: z.array(z.number().finite()).min(1).max(201),
  /** inflationPressure only: the axle to vary (both when omitted). */
  axle: z.enum(["front", "rear"]).optional(),
  /** Limits the user declares (clearances, maker's settings): values outside are infeasible. */
  limits: z.object({ min: z.number().optional(), max: z.number().optional() }).optional(),
});
export type TSweepSpec = z.input<typeof ZSweepSpec>;

export interface TSweepPoint {
  value: number;
  feasible: boolean;
  /** Tyre cost per operating hour (dealership currency/h); null when the estimate failed. */
  costPerHour: number | null;
  /** Hours until the first position reaches replacement depth; null when no wear or failed. */
  hoursToReplacement: number | null;
  warnings: TWarning[];
}

export interface TSweepResult {
  parameter: TSweepParameter;
  points: TSweepPoint[];
  best: { value: number; costPerHour: number } | null;
  current: { value: number; costPerHour: number };
  cautions: TCaution[];
}

/** Warnings that make a setting unusable (the machine cannot do the duty, or overloads a tyre). */
const BLOCKING = new Set([
  "radius-infeasible",
  "steer-input-infeasible",
  "steering-mode-missing",
  "load-over-capacity",
  "high-lateral-acceleration",
]);

const key = (w: TWarning) => `${w.code}:${w.turnIndex ?? ""}`;

/**
 * A setting is feasible when it overloads no tyre and adds no blocking problem (a turn the
 * machine cannot make, a missing mode, sliding) that the current setup does not already have:
 * a duty cycle with one turn too tight for every setting still gets a best value.
 */
export function isFeasible(result: TEstimateResult, baseline?: TEstimateResult): boolean {
  const known = new Set(baseline?.warnings.filter((w) => w.severity === "error").map(key) ?? []);
  return !result.warnings.some(
    (w) =>
      w.severity === "error" &&
      BLOCKING.has(w.code) &&
      (w.code === "load-over-capacity" || !known.has(key(w))),
  );
}

export function firstLife(result: TEstimateResult): number | null {
  let min: number | null = null;
  for (const p of result.positions) {
    if (p.hoursToReplacement !== null && (min === null || p.hoursToReplacement < min)) {
      min = p.hoursToReplacement;
    }
  }
  return min;
}

/**
 * Run the estimate for each value of one parameter. `best` is the lowest cost per hour among
 * feasible values inside the declared limits; `points` keeps the order of `values`.
 */
export function sweepParameter(
  machine: TMachineInput,
  dutyCycle: TDutyCycleInput,
  specInput: TSweepSpec,
  options: TEstimateOptions = {},
): TSweepResult {
  const parsed = ZSweepSpec.safeParse(specInput);
  if (!parsed.success) {
    throw new Error(`Sweep is invalid:\n${z.prettifyError(parsed.error)}`, { cause: parsed.error });
  }
  const spec = parsed.data;
  const quiet = { ...options, turnDetail: false };
  const currentValue = parameterValue(machine, spec.parameter, spec.axle);
  const current = estimate(machine, dutyCycle, quiet);
  const points = spec.values.map<TSweepPoint>((value) => {
    const outside =
      (spec.limits?.min !== undefined && value < spec.limits.min) ||
      (spec.limits?.max !== undefined && value > spec.limits.max);
    try {
      const variant = applyChanges(machine, dutyCycle, [
        { kind: "parameter", parameter: spec.parameter, value, axle: spec.axle },
      ]);
      const result = estimate(variant.machine, variant.dutyCycle, quiet);
      const warnings = [...result.warnings];
      if (outside) {
        warnings.push({
          code: "outside-limits",
          severity: "error",
          message: `${spec.parameter} ${value} is outside the declared limits.`,
        });
      }
      return {
        value,
        feasible: !outside && isFeasible(result, current),
        costPerHour: result.costPerHour,
        hoursToReplacement: firstLife(result),
        warnings,
      };
    } catch (error) {
      return {
        value,
        feasible: false,
        costPerHour: null,
        hoursToReplacement: null,
        warnings: [
          {
            code: "option-not-applicable",
            severity: "error",
            message: `${spec.parameter} ${value}: ${(error as Error).message}`,
          },
        ],
      };
    }
  });
  let best: TSweepResult["best"] = null;
  for (const p of points) {
    if (p.feasible && p.costPerHour !== null && (!best || p.costPerHour < best.costPerHour)) {
      best = { value: p.value, costPerHour: p.costPerHour };
    }
  }
  return {
    parameter: spec.parameter,
    points,
    best,
    current: { value: currentValue, costPerHour: current.costPerHour },
    cautions: parameterCautions(spec.parameter),
  };
}
