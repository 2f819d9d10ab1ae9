import { currentFitment, meanDepth, type TReadingPoint } from "./intervals";
import type { TTyrePosition } from "./types";

export type TAlertKind =
  "due-soon" | "fast-wear" | "shoulder-wear" | "centre-wear" | "one-shoulder";

export type TTreadAlert = {
  kind: TAlertKind;
  position: TTyrePosition;
  message: string;
  /** The usual causes in the trade (common practice, no source), for the dealer to check. */
  causes: string[];
};

/** Measured wear this much above the prediction flags the position. */
export const FAST_WEAR_RATIO = 1.5;
/** Depth difference across the tread (mm) that counts as uneven wear. */
export const UNEVEN_MM = 2;
/** A measured rate needs this many hours behind it before it is compared with the model. */
const MIN_HOURS_FOR_RATE = 50;

const CAUSES = {
  fast: [
    "Steering geometry out of adjustment (toe, linkage or front-axle lead)",
    "Inflation pressure wrong for the load and speed",
    "Wheel misalignment or a bent axle, tie rod or steering arm",
    "More road work or heavier loads than the duty cycle describes",
  ],
  oneShoulder: [
    "Toe-in or toe-out out of adjustment (misalignment)",
    "Camber or king-pin wear, a bent steering arm",
    "Steering fault making the wheel scrub through turns",
  ],
  shoulders: ["Under-inflation for the load", "Overloading the axle"],
  centre: ["Over-inflation for the load (a road pressure used in the field)"],
};

/**
 * Alerts for one position from its current fitment's readings: due within `withinHours`,
 * wearing much faster than predicted, or uneven across the tread in the last reading.
 */
export function positionAlerts({
  position,
  readings,
  wearPer100h,
  hoursLeft,
  withinHours,
}: {
  position: TTyrePosition;
  readings: readonly TReadingPoint[];
  wearPer100h: number;
  hoursLeft: number | null;
  withinHours: number;
}): TTreadAlert[] {
  const out: TTreadAlert[] = [];
  const fitment = currentFitment(readings, position);
  const last = fitment.at(-1);
  if (!last) return out;
  if (hoursLeft !== null && hoursLeft <= withinHours) {
    out.push({
      kind: "due-soon",
      position,
      message:
        hoursLeft <= 0
          ? "At or below its replacement depth now."
          : `Reaches its replacement depth in about ${Math.round(hoursLeft)} operating hours.`,
      causes: [],
    });
  }
  const first = fitment[0]!;
  const hours = last.hourMeter - first.hourMeter;
  if (hours >= MIN_HOURS_FOR_RATE && wearPer100h > 0) {
    const measured = ((meanDepth(first) - meanDepth(last)) / hours) * 100;
    if (measured > FAST_WEAR_RATIO * wearPer100h) {
      out.push({
        kind: "fast-wear",
        position,
        message: `Wearing ${measured.toFixed(1)} mm per 100 h, ${(measured / wearPer100h).toFixed(1)}× the predicted ${wearPer100h.toFixed(1)} mm per 100 h.`,
        causes: CAUSES.fast,
      });
    }
  }
  const { depthCentre: c, depthInner: i, depthOuter: o } = last;
  if (i !== null && o !== null) {
    if (Math.abs(i - o) >= UNEVEN_MM) {
      out.push({
        kind: "one-shoulder",
        position,
        message: `The ${i < o ? "inner" : "outer"} shoulder is ${Math.abs(i - o).toFixed(1)} mm lower than the other.`,
        causes: CAUSES.oneShoulder,
      });
    } else if (c - Math.max(i, o) >= UNEVEN_MM) {
      out.push({
        kind: "shoulder-wear",
        position,
        message: `Both shoulders are ${(c - Math.max(i, o)).toFixed(1)} mm or more below the centre.`,
        causes: CAUSES.shoulders,
      });
    } else if (Math.min(i, o) - c >= UNEVEN_MM) {
      out.push({
        kind: "centre-wear",
        position,
        message: `The centre is ${(Math.min(i, o) - c).toFixed(1)} mm or more below both shoulders.`,
        causes: CAUSES.centre,
      });
    }
  }
  return out;
}
