import { toDegrees, toRadians } from "./angles";
import { collect } from "./collect-turn";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import { ackermannOuterRad } from "./steer-maps";
import { solveLateral } from "./turn-solver";
import { infeasible, state, type TurnContext, type UnitTurn } from "./unit-turn";

/** Crab traverse: all wheels steered one way, yaw rate 0; solve the travel direction. */
export function crabTurn(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
): UnitTurn {
  if (mode.steering.layout !== "crab") throw new Error("crab mode expected");
  if (turn.steerInput === undefined) {
    return infeasible(
      mode,
      NaN,
      NaN,
      "steer-input-infeasible",
      "Crab traverses need steerInput (the crab angle in degrees) and crabDistance, not a radius.",
    );
  }
  const p = toRadians(turn.steerInput);
  if (p > mode.maxInput + 1e-9) {
    return infeasible(
      mode,
      NaN,
      turn.steerInput,
      "steer-input-infeasible",
      `Crab angle ${turn.steerInput}° exceeds the ${toDegrees(mode.maxInput).toFixed(1)}° lock.`,
    );
  }
  const w = mode.wheels;
  const ackermann = mode.steering.wheelAngles === "ackermann";
  const frontK = pm.front.pivotTrack / pm.wheelbase;
  const rearK = pm.rear.pivotTrack / pm.wheelbase;
  w.setSteer(0, p);
  w.setSteer(1, ackermann ? ackermannOuterRad(p, frontK) : p);
  w.setSteer(2, p);
  w.setSteer(3, ackermann ? ackermannOuterRad(p, rearK) : p);
  for (let i = 0; i < 4; i++) {
    const outward = i % 2 === 0 ? 1 : -1;
    const rs = mode.pivots.scrubRadius[i] as number;
    const d = w.steer[i] as number; // crab: contact offset
    w.x[i] = (mode.pivots.px[i] as number) - outward * rs * Math.sin(d);
    w.y[i] = (mode.pivots.py[i] as number) + outward * rs * Math.cos(d);
  }
  state.v = Math.tan(p);
  solveLateral(w, 1, 0, 0, state);
  const result = collect(pm, mode, turn, ctx, mirrored, 1 / Math.hypot(1, state.v), "metre");
  result.radius = Infinity;
  result.steerInput = turn.steerInput;
  result.converged = state.converged;
  return result;
}
