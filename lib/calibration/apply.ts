import type { TMultipliers, TTyrePosition, TWearComponents } from "./types";

export type TPositionBasis = {
  position: TTyrePosition;
  designation: string;
  /** Model wear in mm per 100 h, per term (the estimate's uncalibrated split). */
  components: TWearComponents;
  treadDepthNew: number;
  treadDepthReplace: number;
  /** Price of one tyre, in the dealership's currency. */
  price: number;
};

export type TPositionPrediction = {
  position: TTyrePosition;
  designation: string;
  /** mm per 100 h after the multipliers. */
  wearPer100h: TWearComponents & { total: number };
  hoursToReplacement: number | null;
  costPerHour: number | null;
};

/** Scales each term of the model by its multiplier; tread life and cost per hour follow. */
export function predictPositions(
  basis: readonly TPositionBasis[],
  multipliers: TMultipliers,
): TPositionPrediction[] {
  return basis.map((p) => {
    const base = p.components.base * multipliers.base;
    const scrub = p.components.scrub * multipliers.scrub;
    const total = base + scrub;
    const usable = p.treadDepthNew - p.treadDepthReplace;
    const hours = total > 0 && usable > 0 ? (usable / total) * 100 : null;
    return {
      position: p.position,
      designation: p.designation,
      wearPer100h: { base, scrub, total },
      hoursToReplacement: hours,
      costPerHour: hours ? p.price / hours : null,
    };
  });
}
