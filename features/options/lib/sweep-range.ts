/**
 * The sweep form's range: a sensible default span around today's value, evenly spaced values
 * and the limits, read from what the dealer typed (display units) into an engine sweep (SI).
 */
import type { TSweepParameter, TSweepSpec } from "@/lib/scrub";

export type TSweepFormValues = {
  parameter: TSweepParameter | "";
  axle: "" | "front" | "rear";
  from: string;
  to: string;
  points: string;
  min: string;
  max: string;
};

/** Half-width of the default range in display units, or a share of today's value. */
const SPAN: Record<TSweepParameter, (v: number) => [number, number]> = {
  armAngle: (v) => [Math.max(0, v - 10), Math.min(60, v + 10)],
  frontTrack: (v) => [v * 0.85, v * 1.15],
  rearTrack: (v) => [v * 0.85, v * 1.15],
  lead: (v) => [v - 4, v + 4],
  hingePosition: (v) => [Math.max(0.05, v - 0.15), Math.min(0.95, v + 0.15)],
  rearSteerRatio: (v) => [Math.max(0.05, v - 0.5), Math.min(1.5, v + 0.5)],
  inflationPressure: (v) => [v * 0.6, v * 1.4],
};

/** A default range around today's value (display units). */
export function suggestedRange(parameter: TSweepParameter, current: number): [number, number] {
  return SPAN[parameter](current);
}

/** `n` evenly spaced values from `from` to `to`, both included. */
export function evenlySpaced(from: number, to: number, n: number): number[] {
  if (n === 1) return [from];
  return Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
}

const parse = (raw: string) => {
  const t = raw.trim();
  return t === "" ? null : Number(t.replace(",", "."));
};

/** Reads the form into a sweep, or says per field what to fix. */
export function readSweepForm(
  v: TSweepFormValues,
  toSi: (p: TSweepParameter, value: number) => number,
):
  | { ok: true; sweep: TSweepSpec }
  | { ok: false; errors: Partial<Record<keyof TSweepFormValues, string>> } {
  const errors: Partial<Record<keyof TSweepFormValues, string>> = {};
  if (!v.parameter) errors.parameter = "Choose the setting to vary.";
  const from = parse(v.from);
  const to = parse(v.to);
  const n = parse(v.points);
  const min = parse(v.min);
  const max = parse(v.max);
  if (from === null || !Number.isFinite(from)) errors.from = "Enter the first value as a number.";
  if (to === null || !Number.isFinite(to)) errors.to = "Enter the last value as a number.";
  else if (from !== null && Number.isFinite(from) && to <= from)
    errors.to = "The last value must be larger than the first.";
  if (n === null || !Number.isInteger(n) || n < 2 || n > 201)
    errors.points = "Enter a whole number of points from 2 to 201.";
  if (min !== null && !Number.isFinite(min)) errors.min = "Enter a number or leave it empty.";
  if (max !== null && !Number.isFinite(max)) errors.max = "Enter a number or leave it empty.";
  if (min !== null && max !== null && Number.isFinite(min) && Number.isFinite(max) && max < min)
    errors.max = "The highest allowed value must not be below the lowest.";
  if (Object.keys(errors).length > 0 || !v.parameter) return { ok: false, errors };
  const p = v.parameter;
  const limits = {
    ...(min !== null ? { min: toSi(p, min) } : {}),
    ...(max !== null ? { max: toSi(p, max) } : {}),
  };
  return {
    ok: true,
    sweep: {
      parameter: p,
      values: evenlySpaced(from!, to!, n!).map((x) => toSi(p, x)),
      ...(p === "inflationPressure" && v.axle ? { axle: v.axle } : {}),
      ...(Object.keys(limits).length > 0 ? { limits } : {}),
    },
  };
}
