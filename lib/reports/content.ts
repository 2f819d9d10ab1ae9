import type {
  TCaution,
  TDutyCycleInput,
  TEstimateResult,
  TMachineInput,
  TPosition,
} from "@/lib/scrub";
import { reportAssumptions, type TAssumption } from "@/lib/reports/assumptions";
import type { TReportCalibration } from "@/lib/reports/calibration-note";
import { summariseEngineDutyCycle, type TReportDutyCycleSummary } from "@/lib/reports/duty-cycle";
import { paybackOf } from "@/lib/reports/payback";

/**
 * Bumped when the frozen content's shape changes; readers keep understanding older shapes.
 * 2: options carry the comparison's reasons, the cautions of what they change and feasibility.
 */
export const REPORT_CONTENT_SCHEMA = 2;

export type TFitmentLine = {
  axle: "front" | "rear";
  designation: string;
  /** Price of one tyre (report currency). */
  price: number;
  treadDepthNew: number;
  treadDepthReplace: number;
  /** Axle load (kg). */
  load: number;
  loadCapacity: number | null;
};

export type TReportMachine = {
  name: string;
  layout: string;
  /** m */
  wheelbase: number;
  /** m, front and rear */
  tracks: { front: number; rear: number };
  drive: string;
  fitment: TFitmentLine[];
};

export type TReportPosition = {
  position: TPosition;
  designation: string;
  /** h; null when no wear is predicted */
  hoursToReplacement: number | null;
  /** Price of the tyre that replaces it (report currency). */
  replacementCost: number;
  /** report currency per operating hour */
  costPerHour: number;
  /** mm per 100 h */
  wearPer100h: { base: number; scrub: number; total: number };
  calibrated: boolean;
  wearsFirst: boolean;
};

/** One setup the customer could run: the machine as it is, or a change the dealer priced. */
export type TReportOption = {
  key: string;
  label: string;
  /** The machine as the customer runs it today; payback is measured against it. */
  baseline: boolean;
  description: string;
  machine: TReportMachine;
  estimateId: string | null;
  /** One-off cost of making the change (report currency); 0 for the baseline. */
  oneOffCost: number;
  costPerHour: number;
  positions: TReportPosition[];
  /** Saving against the baseline (report currency per operating hour); null for the baseline. */
  savingPerHour: number | null;
  /** Operating hours until the saving repays the one-off cost; null when it never does. */
  paybackHours: number | null;
  warnings: string[];
  rotation: string[];
  /** Plain-words reasons from the comparison (schema 2; absent in older versions). */
  reasons?: string[];
  /** Cautions for what this option changes: tyres, pressures, loads, track (schema 2). */
  cautions?: TCaution[];
  /** False when the option overloads a tyre or adds a turn the machine cannot make (schema 2). */
  feasible?: boolean;
  /** The engine's result as issued (per-turn detail for the CSV annex and charts). */
  result: TEstimateResult;
};

export type TReportContent = {
  schema: 1 | typeof REPORT_CONTENT_SCHEMA;
  kind: "estimate" | "comparison";
  title: string;
  currency: string;
  dealership: { name: string; contactLine: string };
  customer: { name: string; contactName: string | null };
  dutyCycle: TReportDutyCycleSummary;
  options: TReportOption[];
  /** The workable option with the lowest cost per operating hour. */
  recommendedKey: string | null;
  recommendations: string;
  customerNote: string;
  assumptions: TAssumption[];
  cautions: TCaution[];
  engineVersion: string;
  issuedAt: string;
  issuedBy: string;
};

export type TOptionSource = {
  key: string;
  label: string;
  description?: string;
  baseline: boolean;
  estimateId: string | null;
  oneOffCost: number;
  machine: TMachineInput;
  result: TEstimateResult;
  reasons?: string[];
  cautions?: TCaution[];
  feasible?: boolean;
};

function machineOf(spec: TMachineInput): TReportMachine {
  const axle = (which: "front" | "rear"): TFitmentLine => {
    const a = spec.axles[which];
    return {
      axle: which,
      designation: a.tyre.designation,
      price: a.tyre.price,
      treadDepthNew: a.tyre.treadDepthNew,
      treadDepthReplace: a.tyre.treadDepthReplace,
      load: a.load,
      loadCapacity: a.tyre.loadCapacity ?? null,
    };
  };
  return {
    name: spec.name,
    layout: spec.steering.layout,
    wheelbase: spec.wheelbase,
    tracks: { front: spec.axles.front.track, rear: spec.axles.rear.track },
    drive: spec.drive.type,
    fitment: [axle("front"), axle("rear")],
  };
}

function positionsOf(
  spec: TMachineInput,
  result: TEstimateResult,
  calibrated: boolean,
): TReportPosition[] {
  return result.positions.map((p) => ({
    position: p.position,
    designation: p.designation,
    hoursToReplacement: p.hoursToReplacement,
    replacementCost: spec.axles[p.position.startsWith("front") ? "front" : "rear"].tyre.price,
    costPerHour: p.costPerHour,
    wearPer100h: p.wearPer100h,
    calibrated: calibrated || p.wearCoefficient.calibrated,
    wearsFirst: p.wearsFirst,
  }));
}

/**
 * The frozen content of a quote report: every figure the web page, the PDF and the CSV annex
 * show, so nothing is read from the live machine, duty cycle or estimate once issued. A report
 * from one estimate is the one-option case of a comparison.
 */
export function buildReportContent(input: {
  kind: "estimate" | "comparison";
  title: string;
  currency: string;
  dealership: { name: string; contactLine: string };
  customer: { name: string; contactName: string | null };
  dutyCycle: TDutyCycleInput;
  options: TOptionSource[];
  recommendations: string;
  customerNote: string;
  issuedAt: Date;
  issuedBy: string;
  /** The calibration the figures ran with (a calibrated estimate or its comparison), if any. */
  calibration?: TReportCalibration | null;
}): TReportContent {
  if (input.options.length === 0) throw new Error("A report needs at least one option.");
  const baseline = input.options.find((o) => o.baseline) ?? input.options[0]!;
  const options: TReportOption[] = input.options.map((o) => {
    const isBaseline = o === baseline;
    const saving = isBaseline ? null : baseline.result.costPerHour - o.result.costPerHour;
    return {
      key: o.key,
      label: o.label,
      baseline: isBaseline,
      description: o.description ?? "",
      machine: machineOf(o.machine),
      estimateId: o.estimateId,
      oneOffCost: isBaseline ? 0 : o.oneOffCost,
      costPerHour: o.result.costPerHour,
      positions: positionsOf(o.machine, o.result, Boolean(input.calibration)),
      savingPerHour: saving,
      paybackHours: isBaseline ? null : paybackOf(o.oneOffCost, saving ?? 0),
      warnings: o.result.warnings.map((w) => w.message),
      rotation: o.result.rotation.map((r) => r.note),
      reasons: o.reasons ?? [],
      cautions: o.cautions ?? [],
      feasible: o.feasible ?? true,
      result: o.result,
    };
  });
  // Only a setup the customer could actually run is recommended.
  const finite = options.filter((o) => o.feasible !== false && Number.isFinite(o.costPerHour));
  const recommended = finite.reduce<TReportOption | null>(
    (best, o) => (!best || o.costPerHour < best.costPerHour ? o : best),
    null,
  );
  const first = options[0]!;
  return {
    schema: REPORT_CONTENT_SCHEMA,
    kind: input.kind,
    title: input.title,
    currency: input.currency,
    dealership: input.dealership,
    customer: input.customer,
    dutyCycle: summariseEngineDutyCycle(input.dutyCycle),
    options,
    recommendedKey: recommended?.key ?? null,
    recommendations: input.recommendations,
    customerNote: input.customerNote,
    assumptions: reportAssumptions(first.result, input.dutyCycle, input.calibration ?? null),
    cautions: [...first.result.cautions],
    engineVersion: first.result.engineVersion,
    issuedAt: input.issuedAt.toISOString(),
    issuedBy: input.issuedBy,
  };
}
