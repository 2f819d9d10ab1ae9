import { z } from "zod";
import { estimate } from "./estimate";
import { applyChanges, ZMachineChange, type TMachineChange } from "./machine-changes";
import { optionCautions } from "./option-cautions";
import { optionReasons } from "./option-reasons";
import type {
  TCaution,
  TDutyCycleInput,
  TEstimateOptions,
  TEstimateResult,
  TMachineInput,
  TPosition,
  TWarning,
} from "./schemas";
import { firstLife, isFeasible } from "./sweep-parameter";

export const ZOptionSpec = z.object({
  /** The dealer's name for the option, e.g. "Corrected linkage". */
  name: z.string().trim().min(1).max(120),
  /** Changes against the current machine, applied in order. */
  changes: z.array(ZMachineChange).min(1).max(10),
  /** One-off cost of the change: parts, fitting, new tyres (dealership currency). */
  oneOffCost: z.number().nonnegative(),
});
export type TOptionSpec = z.input<typeof ZOptionSpec>;

export const ZCompareSettings = z.object({
  /** Operating hours over which cost is totalled (default 2,000 h). */
  hours: z.number().positive().max(100_000).default(2000),
});

export interface TOptionPosition {
  position: TPosition;
  designation: string;
  hoursToReplacement: number | null;
  costPerHour: number;
  wearPer100h: { base: number; scrub: number; traction: number; total: number };
  loadRatio: number;
}

export interface TOptionOutcome {
  name: string;
  changes: TMachineChange[];
  oneOffCost: number;
  feasible: boolean;
  /** Tyre cost per operating hour (dealership currency/h). */
  costPerHour: number;
  /** oneOffCost + costPerHour × hours. */
  costOverHours: number;
  /** Current cost per hour − this option's (positive = saves). */
  savingPerHour: number;
  /** Hours for the saving to repay the one-off cost; null when it never does. */
  paybackHours: number | null;
  /** Hours until the first position reaches its replacement depth. */
  firstReplacementHours: number | null;
  lead: number | null;
  positions: TOptionPosition[];
  /** Plain-words reasons computed from the results. */
  reasons: string[];
  warnings: TWarning[];
  /** Cautions for what the change touches (tyres, loads, pressures, track). */
  cautions: TCaution[];
}

export interface TComparisonResult {
  engineVersion: string;
  hours: number;
  current: TOptionOutcome;
  options: TOptionOutcome[];
  /** Standing cautions shown with every estimate. */
  cautions: TCaution[];
}

function outcome(
  name: string,
  changes: TMachineChange[],
  oneOffCost: number,
  result: TEstimateResult,
  hours: number,
  baseline: TEstimateResult,
): TOptionOutcome {
  const currentCost = baseline.costPerHour;
  const saving = currentCost - result.costPerHour;
  return {
    name,
    changes,
    oneOffCost,
    feasible: isFeasible(result, baseline),
    costPerHour: result.costPerHour,
    costOverHours: oneOffCost + result.costPerHour * hours,
    savingPerHour: saving,
    paybackHours: saving > 0 ? oneOffCost / saving : oneOffCost === 0 && saving === 0 ? 0 : null,
    firstReplacementHours: firstLife(result),
    lead: result.lead,
    positions: result.positions.map((p) => ({
      position: p.position,
      designation: p.designation,
      hoursToReplacement: p.hoursToReplacement,
      costPerHour: p.costPerHour,
      wearPer100h: p.wearPer100h,
      loadRatio: p.loadRatio,
    })),
    reasons: [],
    warnings: result.warnings,
    cautions: optionCautions(changes),
  };
}

/**
 * One duty cycle against two to four machine variants, each with its one-off cost: per-position
 * life, cost per hour, cost over `hours`, payback against the current setup and the reasons.
 */
export function compareOptions(
  machine: TMachineInput,
  dutyCycle: TDutyCycleInput,
  optionsInput: readonly TOptionSpec[],
  settingsInput: z.input<typeof ZCompareSettings> & TEstimateOptions = {},
): TComparisonResult {
  const parsed = z.array(ZOptionSpec).min(1).max(4).safeParse(optionsInput);
  if (!parsed.success) {
    throw new Error(`Options are invalid:\n${z.prettifyError(parsed.error)}`, {
      cause: parsed.error,
    });
  }
  const { hours, ...estimateOptions } = settingsInput;
  const total = ZCompareSettings.parse({ hours }).hours;
  const quiet: TEstimateOptions = { ...estimateOptions, turnDetail: false };
  const base = estimate(machine, dutyCycle, quiet);
  const current = outcome("Current setup", [], 0, base, total, base);
  current.paybackHours = null;
  const options = parsed.data.map((spec) => {
    let variant;
    try {
      variant = applyChanges(machine, dutyCycle, spec.changes);
    } catch (error) {
      throw new Error(`Option "${spec.name}": ${(error as Error).message}`, { cause: error });
    }
    const result = estimate(variant.machine, variant.dutyCycle, quiet);
    const o = outcome(spec.name, spec.changes, spec.oneOffCost, result, total, base);
    o.reasons = optionReasons(base, result);
    return o;
  });
  return {
    engineVersion: base.engineVersion,
    hours: total,
    current,
    options,
    cautions: base.cautions,
  };
}
