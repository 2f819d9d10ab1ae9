export const rad = (d: number) => (d * Math.PI) / 180;
export const deg = (r: number) => (r * 180) / Math.PI;

/**
 * Independent loop-closure residual written from the four-bar geometry (pivots at (0, ±T/2),
 * arms of length r at angle β inboard, tie rod joining the arm ends): |P_R − P_L| − l.
 */
export function closureResidual(
  T: number,
  r: number,
  betaDeg: number,
  tieRod: "behind" | "ahead",
  innerDeg: number,
  outerDeg: number,
): number {
  const dir = tieRod === "behind" ? -1 : 1; // arms point rearward (behind) or forward (ahead)
  const arm = (side: 1 | -1, steer: number) => {
    // Straight-ahead arm vector for the left (side = 1) or right (side = −1) wheel.
    const ax = dir * r * Math.cos(rad(betaDeg));
    const ay = dir * side * r * Math.sin(rad(betaDeg));
    const c = Math.cos(rad(steer));
    const s = Math.sin(rad(steer));
    return { x: ax * c - ay * s, y: side * (T / 2) + ax * s + ay * c };
  };
  const l0 = Math.hypot(arm(1, 0).x - arm(-1, 0).x, arm(1, 0).y - arm(-1, 0).y);
  const pl = arm(1, innerDeg);
  const pr = arm(-1, outerDeg);
  return Math.hypot(pr.x - pl.x, pr.y - pl.y) - l0;
}
