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
  sinArm: number;
  cosArm: number;
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
  return {
    pivotTrack,
    armLength,
    armAngle: armAngleRad,
    side,
    tieRodLength,
    sinArm: Math.sin(armAngleRad),
    cosArm: Math.cos(armAngleRad),
  };
}

/** Result of one linkage solve (reused object, no allocation in loops). */
export interface TrapezoidSolution {
  outer: number;
  sinOuter: number;
  cosOuter: number;
  /** dδ_o/dδ_i by implicit differentiation of the loop closure. */
  slope: number;
}

/**
 * Outer-wheel angle for inner-wheel angle δ_i (rad; sin/cos passed in) by exact loop closure
 * |P_R(δ_o) − P_L(δ_i)| = l, closed form of PHYSICS.md §1.5 [C]:
 *   D = P_L − K_R, Q = (r² + |D|² − l²)/2, A = −s r d_x, B = s r d_y,
 *   φ = atan2(B, A) ± arccos(Q/√(A²+B²)), δ_o = β − φ (root nearest δ_i).
 * Sines and cosines of δ_o follow from those of β and φ without further trig calls.
 * Returns false when the linkage cannot reach δ_i (arms past dead centre).
 */
export function solveTrapezoid(
  k: TrapezoidLinkage,
  inner: number,
  sinInner: number,
  cosInner: number,
  out: TrapezoidSolution,
): boolean {
  const { armLength: r, armAngle: b, side: s, pivotTrack: t, tieRodLength: l } = k;
  const sinB = k.sinArm;
  const cosB = k.cosArm;
  const cbi = cosB * cosInner - sinB * sinInner;
  const sbi = sinB * cosInner + cosB * sinInner;
  // Inner (left) ball joint relative to the right pivot K_R = (0, −T/2).
  const dx = -s * r * cbi;
  const dy = t - s * r * sbi;
  const q = (r * r + dx * dx + dy * dy - l * l) / 2;
  const a = -s * r * dx;
  const bb = s * r * dy;
  const h = Math.sqrt(a * a + bb * bb);
  const ratio = q / h;
  if (!(Math.abs(ratio) <= 1)) return false;
  const base = Math.atan2(bb, a);
  const spread = Math.acos(ratio);
  const o1 = wrapPi(b - (base + spread));
  const o2 = wrapPi(b - (base - spread));
  const pick = Math.abs(o1 - inner) <= Math.abs(o2 - inner) ? 1 : -1;
  const cosBase = a / h;
  const sinBase = bb / h;
  const sinSpread = Math.sqrt(Math.max(0, 1 - ratio * ratio));
  const cosPhi = cosBase * ratio - pick * sinBase * sinSpread;
  const sinPhi = sinBase * ratio + pick * cosBase * sinSpread;
  out.outer = pick === 1 ? o1 : o2;
  out.sinOuter = sinB * cosPhi - cosB * sinPhi;
  out.cosOuter = cosB * cosPhi + sinB * sinPhi;
  // Implicit slope: h(δ_i, δ_o) = |P_R − P_L|² − l² = 0 ⇒ dδ_o/dδ_i = −h_i/h_o.
  const plx = -s * r * cbi;
  const ply = t / 2 - s * r * sbi;
  const prx = -s * r * cosPhi;
  const pry = -t / 2 + s * r * sinPhi;
  const ex = prx - plx;
  const ey = pry - ply;
  const hInner = -(ex * (s * r * sbi) + ey * (-s * r * cbi));
  const hOuter = ex * (-s * r * sinPhi) + ey * (-s * r * cosPhi);
  out.slope = -hInner / hOuter;
  return true;
}

const scratch: TrapezoidSolution = { outer: 0, sinOuter: 0, cosOuter: 1, slope: 1 };

/** Outer angle (rad) for inner angle (rad), NaN when unreachable. */
export function trapezoidOuterRad(k: TrapezoidLinkage, inner: number): number {
  return solveTrapezoid(k, inner, Math.sin(inner), Math.cos(inner), scratch) ? scratch.outer : NaN;
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
  const di = toRadians(inner);
  const solution: TrapezoidSolution = { outer: 0, sinOuter: 0, cosOuter: 1, slope: 1 };
  // Past the dead centre the outer wheel would turn back (slope ≤ 0): not a usable lock.
  if (!solveTrapezoid(linkage, di, Math.sin(di), Math.cos(di), solution) || !(solution.slope > 0)) {
    throw new Error(
      `linkageOuterAngle: the linkage cannot reach an inner angle of ${inner}° (arms pass dead centre); reduce the lock or change the arm geometry.`,
    );
  }
  return toDegrees(solution.outer);
}
