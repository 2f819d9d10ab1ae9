import { SKID_EFFECTIVE_TRACK_FACTOR } from "./coefficients";
import { collect } from "./collect-turn";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import { solveLateral } from "./turn-solver";
import {
  F_LON_ENERGY,
  F_LON_SCRUB,
  slot,
  state,
  type TurnContext,
  type UnitTurn,
} from "./unit-turn";

/**
 * Skid steer (PHYSICS.md §4): no steered wheels; the side-speed difference supplies the yaw
 * moment, so only the lateral balance fixes the turning centre's fore-aft position (brush tyres:
 * stiffness-weighted in gentle turns, at the heavier axle in full sliding). Reference point =
 * machine centre; R = lateral offset of the turning centre (0 = pivot turn). Turning resistance
 * moment M_r = |Σ x_i F_i|; the outer side spins and the inner skids (effective track χB), which
 * adds longitudinal slip energy M_r(χ − 1) per radian, shared by load within each side.
 * Tracks: lateral resistance falls with radius as μ_t = μ/(0.925 + 0.15 R/B) (Wong [M]), used
 * here as a factor capped at 1.
 */
export function skidTurn(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
  speed: number,
  mass: number,
  tracked: boolean,
): UnitTurn {
  if (mode.steering.layout !== "skid") throw new Error("skid mode expected");
  const w = mode.wheels;
  const radius = turn.radius ?? 0;
  const track = (pm.front.track + pm.rear.track) / 2;
  if (tracked) {
    const factor = Math.min(1, 1 / (0.925 + (0.15 * radius) / track));
    for (let i = 0; i < 4; i++) w.friction[i] = ctx.surface.friction * factor;
  }
  let u: number;
  let r: number;
  if (radius > 1e-6) {
    u = 1;
    r = 1 / radius;
  } else {
    u = 0;
    r = 1;
  }
  state.v = 0;
  solveLateral(w, u, r, mass, state);
  const result = collect(pm, mode, turn, ctx, mirrored, 1 / r, "radian");
  let moment = 0;
  for (let i = 0; i < 4; i++) moment += (w.x[i] as number) * (w.force[i] as number);
  moment = Math.abs(moment);
  const chi = mode.steering.effectiveTrackFactor ?? SKID_EFFECTIVE_TRACK_FACTOR;
  const out = result.wheels;
  for (let side = 0; side < 2; side++) {
    const a = side;
    const b = side + 2;
    const sideLoad = (w.load[a] as number) + (w.load[b] as number);
    for (let i = a; i <= b; i += 2) {
      const o = slot(i, mirrored);
      out[o + F_LON_SCRUB] = ((chi - 1) * track) / 2;
      out[o + F_LON_ENERGY] = ((moment * (chi - 1)) / 2) * ((w.load[i] as number) / sideLoad);
    }
  }
  result.radius = radius;
  result.steerInput = 0;
  result.centreX = -state.v / r;
  result.centreY = (mirrored ? -1 : 1) * (u / r);
  result.lateralAcceleration = speed * speed * u * r;
  result.turningMoment = moment;
  result.converged = state.converged;
  return result;
}
