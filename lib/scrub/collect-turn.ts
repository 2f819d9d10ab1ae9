import { toDegrees } from "./angles";
import { addLongitudinal } from "./longitudinal";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import {
  F_DISTANCE,
  F_LAT_ENERGY,
  F_LAT_SCRUB,
  F_PATH,
  F_SLIP,
  F_STEER,
  resetScratch,
  slot,
  type TurnContext,
  type UnitTurn,
} from "./unit-turn";

/** Flags a turn whose outer tyre path is inside the machine's minimum turning radius. */
export function checkTurningRadius(pm: PreparedMachine, result: UnitTurn): UnitTurn {
  const limit = pm.machine.limits.minTurningRadius;
  if (limit !== undefined && result.turningDiameter !== null) {
    if (result.turningDiameter / 2 < limit - 1e-9) {
      result.feasible = false;
      result.problem = {
        code: "radius-infeasible",
        message: `Outer tyre path radius ${(result.turningDiameter / 2).toFixed(2)} m is tighter than the machine's minimum turning radius ${limit} m.`,
      };
    }
  }
  return result;
}

/**
 * Per-wheel results from the wheel set after a solve. `unit` converts speeds to distances per
 * unit of motion (1/|r| per radian, 1/V per metre). Adds the longitudinal terms: coupled-axle
 * wind-up from lead (front-assist engaged, 4WD) and locked differentials.
 */
export function collect(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
  unit: number,
  perUnit: "radian" | "metre",
): UnitTurn {
  const w = mode.wheels;
  const result = resetScratch(mode, perUnit);
  const out = result.wheels;
  let maxPath = 0;
  for (let i = 0; i < 4; i++) {
    const o = slot(i, mirrored);
    const sign = mirrored ? -1 : 1;
    const lateral = Math.abs(w.lateralSpeed[i] as number) * unit;
    const rolling = Math.abs(w.rollingSpeed[i] as number) * unit;
    const path = perUnit === "radian" ? Math.sqrt(lateral * lateral + rolling * rolling) : NaN;
    if (path > maxPath) maxPath = path;
    out[o + F_STEER] = sign * toDegrees(w.steer[i] as number);
    out[o + F_SLIP] = sign * toDegrees(Math.atan(w.sigma[i] as number));
    out[o + F_PATH] = path;
    out[o + F_LAT_SCRUB] = lateral;
    out[o + F_LAT_ENERGY] = Math.abs(w.force[i] as number) * lateral;
    out[o + F_DISTANCE] = rolling;
  }
  result.turningDiameter = perUnit === "radian" ? 2 * maxPath : null;

  addLongitudinal(pm, turn, ctx, mirrored, result);
  return result;
}
