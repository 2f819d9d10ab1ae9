import { toDegrees, toRadians } from "./angles";

export type TTieRodSide = "behind" | "ahead";

/** Trapezoid linkage geometry in SI/radians, prepared once per machine. */
export interface TrapezoidLinkage {
  /** Pivot track T_k (m). */
  pivotTrack: number;
  /** Arm length r (m). */
  armLength: number;
  /** Arm angle β (rad). */
  armAngle: number;
  /** +1 tie rod behind the axle (arms point rearward), −1 ahead (arms point forward). */
  side: 1 | -1;
  /** Tie-rod length l (m), from the straight-ahead geometry. */
  tieRodLength: number;
}

export function prepareTrapezoid(
  pivotTrack: number,
  armLength: number,
  armAngleRad: number,
  tieRod: TTieRodSide,
): TrapezoidLinkage {
  const side = tieRod === "behind" ? 1 : -1;
  const tieRodLength = pivotTrack - 2 * side * armLength * Math.sin(armAngleRad);
  if (!(tieRodLength > 0)) {
    throw new Error("Trapezoid linkage: arms are too long or too inclined for the pivot track.");
  }
  return { pivotTrack, armLength, armAngle: armAngleRad, side, tieRodLength };
}

/**
 * Outer-wheel angle (rad) for inner-wheel angle δ_i (rad) by exact loop closure
 * |P_R(δ_o) − P_L(δ_i)| = l, closed form of PHYSICS.md §1.5 [C]:
 *   D = P_L − K_R, Q = (r² + |D|² − l²)/2, A = −s r d_x, B = s r d_y,
 *   φ = atan2(B, A) ± arccos(Q/√(A²+B²)), δ_o = β − φ (root nearest δ_i).
 * Returns NaN when the linkage cannot reach δ_i (toggle / lock-up).
 */
export function trapezoidOuterRad(k: TrapezoidLinkage, inner: number): number {
  const { armLength: r, armAngle: b, side: s, pivotTrack: t, tieRodLength: l } = k;
  // Inner (left) ball joint relative to the right pivot K_R = (0, −T/2).
  const dx = -s * r * Math.cos(b + inner);
  const dy = t - s * r * Math.sin(b + inner);
  const q = (r * r + dx * dx + dy * dy - l * l) / 2;
  const a = -s * r * dx;
  const bb = s * r * dy;
  const h = Math.hypot(a, bb);
  const ratio = q / h;
  if (!(Math.abs(ratio) <= 1)) return NaN;
  const base = Math.atan2(bb, a);
  const spread = Math.acos(ratio);
  const o1 = wrapPi(b - (base + spread));
  const o2 = wrapPi(b - (base - spread));
  return Math.abs(o1 - inner) <= Math.abs(o2 - inner) ? o1 : o2;
}

/** dδ_o/dδ_i of the linkage by implicit differentiation of the loop closure. */
export function trapezoidOuterSlope(k: TrapezoidLinkage, inner: number, outer: number): number {
  const { armLength: r, armAngle: b, side: s, pivotTrack: t } = k;
  // P_L and P_R relative to the axle centre, and their derivatives.
  const plx = -s * r * Math.cos(b + inner);
  const ply = t / 2 - s * r * Math.sin(b + inner);
  const dplx = s * r * Math.sin(b + inner);
  const dply = -s * r * Math.cos(b + inner);
  const prx = -s * r * Math.cos(b - outer);
  const pry = -t / 2 + s * r * Math.sin(b - outer);
  const dprx = -s * r * Math.sin(b - outer);
  const dpry = -s * r * Math.cos(b - outer);
  const ex = prx - plx;
  const ey = pry - ply;
  const hInner = -(ex * dplx + ey * dply);
  const hOuter = ex * dprx + ey * dpry;
  return -hInner / hOuter;
}

function wrapPi(a: number): number {
  let x = a;
  while (x > Math.PI) x -= 2 * Math.PI;
  while (x < -Math.PI) x += 2 * Math.PI;
  return x;
}

/**
 * Outer road-wheel angle (deg) of a trapezoid (four-bar) steering linkage for a given inner
 * angle (deg), solved exactly by loop closure (not the small-angle rule). `armAngle` (deg) is
 * the arm's angle from the fore-aft axis at straight ahead, inclined inboard; the tie-rod length
 * follows from it. Throws when the linkage cannot reach the inner angle.
 */
export function linkageOuterAngle({
  pivotTrack,
  armLength,
  armAngle,
  tieRod,
  inner,
}: {
  /** Distance between the steering pivots (m). */
  pivotTrack: number;
  /** Steering arm length (m). */
  armLength: number;
  /** Arm angle from the fore-aft axis at straight ahead (deg). */
  armAngle: number;
  tieRod: TTieRodSide;
  /** Inner-wheel angle (deg). */
  inner: number;
}): number {
  const linkage = prepareTrapezoid(pivotTrack, armLength, toRadians(armAngle), tieRod);
  const outer = trapezoidOuterRad(linkage, toRadians(inner));
  if (Number.isNaN(outer)) {
    throw new Error(
      `linkageOuterAngle: the linkage cannot reach an inner angle of ${inner}° (arms pass dead centre); reduce the lock or change the arm geometry.`,
    );
  }
  return toDegrees(outer);
}
