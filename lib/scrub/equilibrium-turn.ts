import { toDegrees, toRadians } from "./angles";
import { leastSquaresIcr } from "./least-squares-icr";
import { newSolveState, solveFixedSteer } from "./turn-solver";
import { WheelSet } from "./wheel-set";

export interface TEquilibriumWheelInput {
  /** Tyre contact centre, body frame (m). */
  x: number;
  y: number;
  /** Steer angle, positive left (deg). */
  steer: number;
  /** Vertical load (N). */
  load: number;
  /** Cornering stiffness C_α (N/rad). */
  corneringStiffness: number;
  /** Sliding friction coefficient μ (brush model). */
  friction: number;
}

export interface TEquilibriumWheelResult {
  /** Slip angle α (deg), positive = wheel points left of its path. */
  slip: number;
  /** Lateral tyre force in the wheel frame (N), same sign as slip. */
  lateralForce: number;
  /** Distance of the contact centre from the turning centre (m). */
  pathRadius: number;
  /** Lateral sliding distance for the heading change (m). */
  scrub: number;
  /** Frictional energy for the heading change (J). */
  energy: number;
}

/**
 * Turning centre of a rigid machine whose wheels do not share one centre, from lateral-force and
 * yaw-moment balance (PHYSICS.md §5.2 [C]), solved by Newton on (v, r) with linear (F = C tan α)
 * or brush tyres, started from the least-squares centre (§5.3). Low speed by default; pass
 * `speed` (m/s), `mass` (kg) and `cgX` (m) to include the lateral-acceleration term.
 * Per wheel: scrub s = ρ|sin α|·Δψ and energy E = |F|·s (§5.5).
 */
export function equilibriumTurn({
  wheels,
  tyre,
  headingChange,
  speed = 0,
  mass = 0,
  cgX = 0,
}: {
  wheels: readonly TEquilibriumWheelInput[];
  tyre: "linear" | "brush";
  /** Heading change (deg). */
  headingChange: number;
  speed?: number;
  mass?: number;
  cgX?: number;
}): {
  centre: { x: number; y: number };
  converged: boolean;
  wheels: TEquilibriumWheelResult[];
} {
  if (wheels.length < 2) throw new Error("equilibriumTurn: give at least two wheels.");
  const w = new WheelSet(wheels.length);
  w.brush = tyre === "brush";
  wheels.forEach((wheel, i) => {
    w.x[i] = wheel.x;
    w.y[i] = wheel.y;
    w.setSteer(i, toRadians(wheel.steer));
    w.load[i] = wheel.load;
    w.stiffness[i] = wheel.corneringStiffness;
    w.friction[i] = wheel.friction;
  });
  const u = speed > 0 ? speed : 1;
  const m = speed > 0 ? mass : 0;
  const start = { x: 0, y: 0 };
  const state = newSolveState();
  if (leastSquaresIcr(w, start) && Math.abs(start.y) > 1e-9) {
    state.r = u / start.y;
    state.v = -start.x * state.r;
  }
  solveFixedSteer(w, u, m, cgX, state);
  const r = state.r;
  const dpsi = toRadians(headingChange);
  const centre = { x: -state.v / r, y: state.u / r };
  return {
    centre,
    converged: state.converged,
    wheels: wheels.map((_, i) => {
      const lateralSpeed = w.lateralSpeed[i] as number;
      const rolling = w.rollingSpeed[i] as number;
      const scrub = (Math.abs(lateralSpeed) / Math.abs(r)) * dpsi;
      const force = w.force[i] as number;
      return {
        slip: toDegrees(Math.atan(w.sigma[i] as number)),
        lateralForce: force,
        pathRadius: Math.hypot(lateralSpeed, rolling) / Math.abs(r),
        scrub,
        energy: Math.abs(force) * scrub,
      };
    }),
  };
}
