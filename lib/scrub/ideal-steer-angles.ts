import { toDegrees } from "./angles";

/**
 * Road-wheel angles that meet the Ackermann condition (PHYSICS.md §1.1, Wikipedia "Ackermann
 * steering geometry"): tan δ_i = L/(R − T_k/2), tan δ_o = L/(R + T_k/2), with R the path radius
 * of the fixed-axle centre and T_k the pivot track. Angles in degrees.
 */
export function idealSteerAngles({
  wheelbase,
  pivotTrack,
  radius,
}: {
  /** Fixed axle to steered axle (m). */
  wheelbase: number;
  /** Distance between the steering pivots at the ground (m). */
  pivotTrack: number;
  /** Path radius of the fixed-axle centre (m). */
  radius: number;
}): { inner: number; outer: number } {
  if (!(wheelbase > 0) || !(pivotTrack > 0) || !(radius > 0)) {
    throw new Error("idealSteerAngles: wheelbase, pivotTrack and radius must be positive (m).");
  }
  return {
    inner: toDegrees(Math.atan2(wheelbase, radius - pivotTrack / 2)),
    outer: toDegrees(Math.atan2(wheelbase, radius + pivotTrack / 2)),
  };
}
