import {
  applyChanges,
  ENGINE_VERSION,
  estimate,
  type TComparisonResult,
  type TDutyCycleInput,
  type TEstimateOptions,
  type TMachineInput,
} from "@/lib/scrub";
import type { TOptionSource } from "@/lib/reports/content";

/** A stored comparison's figures no longer match what the engine gives for its frozen inputs. */
export class ComparisonOutdatedError extends Error {}

/** Relative tolerance between the stored and the re-run cost per hour (same engine: identical). */
const SAME = 1e-9;

function sameFigure(stored: number | null, rerun: number): boolean {
  // JSON stores an infinite cost (no wear-out, or a turn it cannot make) as null.
  if (stored === null || !Number.isFinite(stored)) return !Number.isFinite(rerun);
  const [a, b] = [stored, rerun];
  if (!Number.isFinite(b)) return false;
  return Math.abs(a - b) <= SAME * Math.max(1, Math.abs(a), Math.abs(b));
}

/**
 * The options of a stored comparison as a report's option sources: the machine as fitted today
 * (the baseline) and every option the dealer priced, each with its machine variant and the full
 * engine result (per-turn detail for the CSV annex), the comparison's reasons and the cautions
 * of what the option changes.
 *
 * The comparison stored its outcomes without per-turn detail, so each variant is run again from
 * the frozen inputs. That reproduces the stored figures only with the same engine: a comparison
 * run by another engine version (or whose re-run disagrees with it) is refused, so a report never
 * shows figures the dealer did not see; rerunning the comparison brings it up to date.
 */
export function comparisonOptionSources(input: {
  machine: TMachineInput;
  dutyCycle: TDutyCycleInput;
  result: TComparisonResult;
  /** The engine options the comparison ran with (a calibrated estimate's scaled coefficients). */
  engineOptions?: TEstimateOptions;
  /** What the machine is run on today, for the baseline's description. */
  baselineDescription: string;
}): TOptionSource[] {
  const { machine, dutyCycle, result } = input;
  if (result.engineVersion !== ENGINE_VERSION)
    throw new ComparisonOutdatedError(
      `This comparison was run with engine ${result.engineVersion}; the engine is now ${ENGINE_VERSION}. Rerun the comparison, then prepare the report from its new version.`,
    );
  const current = estimate(machine, dutyCycle, input.engineOptions);
  assertSame("As fitted today", result.current.costPerHour, current.costPerHour);
  const baseline: TOptionSource = {
    key: "current",
    label: "As fitted today",
    description: input.baselineDescription,
    baseline: true,
    feasible: true,
    estimateId: null,
    oneOffCost: 0,
    machine,
    result: current,
    reasons: [],
    cautions: [],
  };
  const options = result.options.map((o, i): TOptionSource => {
    const variant = applyChanges(machine, dutyCycle, o.changes);
    const run = estimate(variant.machine, variant.dutyCycle, input.engineOptions);
    assertSame(o.name, o.costPerHour, run.costPerHour);
    return {
      key: `option-${i + 1}`,
      label: o.name,
      description: o.feasible
        ? ""
        : "Not workable as priced: it overloads a tyre or adds a turn the machine cannot make at this duty cycle.",
      baseline: false,
      feasible: o.feasible,
      estimateId: null,
      oneOffCost: o.oneOffCost,
      machine: variant.machine,
      result: run,
      reasons: [...o.reasons],
      cautions: [...o.cautions],
    };
  });
  return [baseline, ...options];
}

function assertSame(name: string, stored: number | null, rerun: number) {
  if (!sameFigure(stored, rerun))
    throw new ComparisonOutdatedError(
      `The comparison's figures for "${name}" no longer match its inputs. Rerun the comparison, then prepare the report from its new version.`,
    );
}
