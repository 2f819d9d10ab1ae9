import type { WheelSet } from "./wheel-set";

/**
 * Least-squares turning centre (PHYSICS.md §5.3 [C]): minimise Σ w_i (h_i·(c − p_i))² with
 * h_i = (cos δ_i, sin δ_i), the squared distance of c from each spin-axis line, weighted by
 * cornering stiffness. Used only as a Newton starting point. Returns false when the spin axes
 * are (nearly) parallel.
 */
export function leastSquaresIcr(w: WheelSet, out: { x: number; y: number }): boolean {
  let a11 = 0;
  let a12 = 0;
  let a22 = 0;
  let b1 = 0;
  let b2 = 0;
  for (let i = 0; i < w.count; i++) {
    const weight = (w.stiffness[i] as number) || 1;
    const c = Math.cos(w.steer[i] as number);
    const s = Math.sin(w.steer[i] as number);
    const proj = c * (w.x[i] as number) + s * (w.y[i] as number);
    a11 += weight * c * c;
    a12 += weight * c * s;
    a22 += weight * s * s;
    b1 += weight * c * proj;
    b2 += weight * s * proj;
  }
  const det = a11 * a22 - a12 * a12;
  if (!(Math.abs(det) > 1e-12 * (a11 + a22) * (a11 + a22))) return false;
  out.x = (a22 * b1 - a12 * b2) / det;
  out.y = (a11 * b2 - a12 * b1) / det;
  return true;
}
