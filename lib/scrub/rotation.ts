import { ROTATION_THRESHOLD } from "./coefficients";
import type { TPosition, TRotationAdvice } from "./schemas";

export interface PositionWear {
  position: TPosition;
  designation: string;
  /** Tread loss rate (mm/h). */
  rate: number;
  /** Usable tread (mm). */
  usable: number;
}

const PAIRS: readonly [TPosition, TPosition, string][] = [
  ["front-left", "front-right", "side"],
  ["rear-left", "rear-right", "side"],
  ["front-left", "rear-left", "axle"],
  ["front-right", "rear-right", "axle"],
];

/**
 * Swap advice for positions fitted with the same size whose wear rates differ by more than
 * ROTATION_THRESHOLD [J]. One swap at half-life evens the pair out [C]: with rates a > b and
 * usable depth U, the pair lasts 2U/(a + b) instead of U/a, swapping at U/(a + b).
 */
export function rotationAdvice(wear: readonly PositionWear[]): TRotationAdvice[] {
  const by = new Map(wear.map((w) => [w.position, w]));
  const advice: TRotationAdvice[] = [];
  for (const [pa, pb, kind] of PAIRS) {
    const a = by.get(pa);
    const b = by.get(pb);
    if (!a || !b || a.designation !== b.designation) continue;
    const fast = Math.max(a.rate, b.rate);
    const slow = Math.min(a.rate, b.rate);
    if (!(fast > 0) || (fast - slow) / fast < ROTATION_THRESHOLD) continue;
    const usable = Math.min(a.usable, b.usable);
    const lifeWith = (2 * usable) / (fast + slow);
    advice.push({
      swap: [pa, pb],
      atHours: lifeWith / 2,
      lifeWithout: usable / fast,
      lifeWith,
      note:
        kind === "side"
          ? "Swapping sides reverses a directional tread: remount each tyre on the other rim so the lugs keep their running direction (common practice, no source)."
          : "Front and rear carry the same size: swap them along each side.",
    });
  }
  return advice;
}
