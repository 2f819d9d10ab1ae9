/**
 * Longitudinal wind-up between two axles coupled at a fixed ratio (PHYSICS.md §7.3 [C]).
 * Kinematic mismatch ε (front must overrun the rear by ε): s_f − s_r = ε; with no net drawbar
 * demand s_f = ε C_r/(C_f + C_r), s_r = −ε C_f/(C_f + C_r); circulating force F = C_eq|ε|,
 * C_eq = C_f C_r/(C_f + C_r), capped when the lighter axle slides (F ≤ μ N_lighter).
 * Writes slips (absolute) and force into `out` to stay allocation-free.
 */
export interface WindUp {
  /** |slip ratio| of the front and rear axle. */
  frontSlip: number;
  rearSlip: number;
  /** Circulating longitudinal force (N). */
  force: number;
}

export function solveWindUp(
  mismatch: number,
  frontStiffness: number,
  rearStiffness: number,
  frontSlideLimit: number,
  rearSlideLimit: number,
  out: WindUp,
): void {
  const e = Math.abs(mismatch);
  const cEq = (frontStiffness * rearStiffness) / (frontStiffness + rearStiffness);
  let force = cEq * e;
  const cap = Math.min(frontSlideLimit, rearSlideLimit);
  if (force > cap) {
    // Lighter axle slides: the heavier axle takes only the elastic slip F/C.
    force = cap;
    if (frontSlideLimit <= rearSlideLimit) {
      out.rearSlip = force / rearStiffness;
      out.frontSlip = Math.max(0, e - out.rearSlip);
    } else {
      out.frontSlip = force / frontStiffness;
      out.rearSlip = Math.max(0, e - out.frontSlip);
    }
  } else {
    out.frontSlip = (e * rearStiffness) / (frontStiffness + rearStiffness);
    out.rearSlip = (e * frontStiffness) / (frontStiffness + rearStiffness);
  }
  out.force = force;
}
