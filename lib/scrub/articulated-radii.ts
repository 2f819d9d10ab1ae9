import { toRadians } from "./angles";

/**
 * Path radii of the front and rear axle centres of a centre-pivot (articulated) machine at
 * articulation γ (PHYSICS.md §2, Hellström 2011 [M]):
 *   R_f = (L_r + L_f cos γ)/sin γ,  R_r = (L_f + L_r cos γ)/sin γ.
 */
export function articulatedRadii({
  frontLength,
  rearLength,
  articulation,
}: {
  /** Hinge to front-axle centre (m). */
  frontLength: number;
  /** Hinge to rear-axle centre (m). */
  rearLength: number;
  /** Articulation angle between the frames (deg); 0 = straight. */
  articulation: number;
}): { front: number; rear: number } {
  const gamma = toRadians(Math.abs(articulation));
  if (gamma === 0) return { front: Infinity, rear: Infinity };
  const s = Math.sin(gamma);
  const c = Math.cos(gamma);
  return {
    front: (rearLength + frontLength * c) / s,
    rear: (frontLength + rearLength * c) / s,
  };
}

/** Articulation angle (rad) that puts the rear-axle centre on path radius R (inverse of R_r). */
export function articulationForRearRadius(
  frontLength: number,
  rearLength: number,
  rearRadius: number,
): number {
  // R_r sin γ − L_r cos γ = L_f  ⇔  √(R_r² + L_r²)·sin(γ − φ) = L_f,  φ = atan2(L_r, R_r)
  const hyp = Math.hypot(rearRadius, rearLength);
  return Math.atan2(rearLength, rearRadius) + Math.asin(Math.min(1, frontLength / hyp));
}
