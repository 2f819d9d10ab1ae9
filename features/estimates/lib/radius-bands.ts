import type { TEstimateResult } from "@/lib/scrub";

export type TRadiusBand = {
  label: string;
  min: number;
  max: number;
  /** Turns per operating hour in the band. */
  turnsPerHour: number;
  /** Mean absolute slip angle over the band's wheels, weighted by occurrences (deg). */
  meanSlipAngle: number;
  /** Lateral plus longitudinal scrub of all wheels per operating hour (m/h). */
  scrubPerHour: number;
  /** Frictional energy per operating hour (J/h). */
  energyPerHour: number;
};

export const RADIUS_BANDS: [number, number][] = [
  [0, 5],
  [5, 10],
  [10, 20],
  [20, 50],
  [50, Infinity],
];

const bandLabel = (min: number, max: number) =>
  max === Infinity ? `${min} m and over` : `${min}–${max} m`;

/** Sums an estimate's feasible turns into turn-radius bands (radius of the machine's reference point). */
export function radiusBands(result: TEstimateResult): TRadiusBand[] {
  return RADIUS_BANDS.map(([min, max]) => {
    let turnsPerHour = 0;
    let slipWeighted = 0;
    let slipWeight = 0;
    let scrubPerHour = 0;
    let energyPerHour = 0;
    for (const t of result.turns) {
      if (!t.feasible) continue;
      const r = Number.isFinite(t.radius) ? t.radius : Infinity;
      // The open last band also takes straight crab traverses (infinite radius).
      if (r < min || (r >= max && max !== Infinity)) continue;
      turnsPerHour += t.perHour;
      energyPerHour += t.energy * t.perHour;
      for (const w of t.wheels) {
        slipWeighted += Math.abs(w.slipAngle) * t.perHour;
        slipWeight += t.perHour;
        scrubPerHour += (w.lateralScrub + w.longitudinalScrub) * t.perHour;
      }
    }
    return {
      label: bandLabel(min, max),
      min,
      max,
      turnsPerHour,
      meanSlipAngle: slipWeight ? slipWeighted / slipWeight : 0,
      scrubPerHour,
      energyPerHour,
    };
  });
}
