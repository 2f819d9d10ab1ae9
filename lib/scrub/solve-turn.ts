import { toDegrees, toRadians } from "./angles";
import { GRAVITY, TRACK_STIFFNESS_COEFFICIENT } from "./coefficients";
import { checkTurningRadius, collect } from "./collect-turn";
import { leastSquaresIcr } from "./least-squares-icr";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import { articulatedTurn } from "./solve-articulated";
import { crabTurn } from "./solve-crab";
import { skidTurn } from "./solve-skid";
import { solveAtRadius, solveFixedSteer } from "./turn-solver";
import { infeasible, state, type TurnContext, type UnitTurn } from "./unit-turn";

const icr = { x: 0, y: 0 };
const loadsN = new Float64Array(4);

/** Wheel loads (N) in the solved (left-turn) frame: mirrored for right turns. */
function fillLoads(pm: PreparedMachine, laden: boolean, mirrored: boolean): number {
  const f = laden ? pm.front.ladenKg : pm.front.unladenKg;
  const r = laden ? pm.rear.ladenKg : pm.rear.unladenKg;
  const fl = mirrored ? 1 - pm.front.leftShare : pm.front.leftShare;
  const rl = mirrored ? 1 - pm.rear.leftShare : pm.rear.leftShare;
  loadsN[0] = f * fl * GRAVITY;
  loadsN[1] = f * (1 - fl) * GRAVITY;
  loadsN[2] = r * rl * GRAVITY;
  loadsN[3] = r * (1 - rl) * GRAVITY;
  return f + r;
}

export function solveUnitTurn(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
): UnitTurn {
  const mirrored = turn.direction === "right";
  const massKg = fillLoads(pm, turn.loadState === "laden", mirrored);
  const w = mode.wheels;
  const mu = ctx.surface.friction;
  const tracked = mode.steering.layout === "skid" && mode.steering.running === "tracked";
  for (let i = 0; i < 4; i++) {
    const load = loadsN[i] as number;
    const axle = i < 2 ? pm.front : pm.rear;
    w.load[i] = load;
    w.friction[i] = mu;
    w.stiffness[i] =
      load * (tracked ? TRACK_STIFFNESS_COEFFICIENT : axle.corneringStiffnessCoefficient);
    w.setSteer(i, 0);
    w.steerSlope[i] = 0;
    w.x[i] = mode.pivots.px[i] as number;
    w.y[i] = mode.pivots.py[i] as number;
  }
  w.brush = true;
  const xcg =
    ((loadsN[0]! + loadsN[1]!) * mode.xFront + (loadsN[2]! + loadsN[3]!) * mode.xRear) /
    (massKg * GRAVITY);
  const moving = turn.speed > 0;
  // Tyre slips are scale-free in (u, v, r), so solve at unit forward speed and carry the speed
  // in the inertia term: Σ F = m·V²·r' with r' = r/V (no underflow at tiny speeds).
  const u = 1;
  const mass = massKg * turn.speed * turn.speed;

  // Grip limit: a steady turn needs m·V²/R of lateral force; beyond Σ μN the machine slides.
  if (moving && turn.radius !== undefined && turn.radius > 0 && mode.layout !== "crab") {
    const needed = (turn.speed * turn.speed) / turn.radius;
    if (needed > mu * GRAVITY) {
      return infeasible(
        mode,
        turn.radius,
        NaN,
        "high-lateral-acceleration",
        `At ${turn.speed} m/s on a ${turn.radius} m radius the lateral acceleration (${needed.toFixed(1)} m/s²) exceeds the grip of this surface (μ = ${mu}): the machine would slide or tip. Slow down.`,
      );
    }
  }

  switch (mode.layout) {
    case "articulated":
      return articulatedTurn(pm, mode, turn, ctx, mirrored, mass);
    case "crab":
      return crabTurn(pm, mode, turn, ctx, mirrored);
    case "skid":
      return skidTurn(pm, mode, turn, ctx, mirrored, turn.speed, mass, tracked);
    default:
      break;
  }

  // Steered rigid-body layouts.
  const map = mode.map;
  if (!map) throw new Error(`No steer map for layout ${mode.layout}`);
  let radius: number;
  let input: number;
  if (turn.radius !== undefined) {
    radius = turn.radius;
    const p0 = mode.kinematicInput(radius);
    if (!(p0 > 0) || p0 > mode.maxInput + 1e-9) {
      const need = p0 > 0 ? `${toDegrees(p0).toFixed(1)}°` : "more than 90°";
      return infeasible(
        mode,
        radius,
        Number.isNaN(p0) ? NaN : toDegrees(p0),
        "radius-infeasible",
        `Radius ${radius} m needs ${need} of steering lock; this steering mode allows ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
    state.p = p0;
    state.v = -mode.xc * (u / radius);
    solveAtRadius(w, map, u, radius, mass, xcg, state);
    input = state.p;
    if (input > mode.maxInput + 1e-9) {
      return infeasible(
        mode,
        radius,
        toDegrees(input),
        "radius-infeasible",
        `Radius ${radius} m needs ${toDegrees(input).toFixed(1)}° of steering lock with tyre slip; this steering mode allows ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
  } else {
    input = toRadians(turn.steerInput ?? 0);
    if (input > mode.maxInput + 1e-9 || !map.apply(input, w)) {
      return infeasible(
        mode,
        NaN,
        turn.steerInput ?? 0,
        "steer-input-infeasible",
        `Steer input ${turn.steerInput}° exceeds this steering mode's ${toDegrees(mode.maxInput).toFixed(1)}° lock.`,
      );
    }
    state.v = 0;
    state.r = 0;
    if (leastSquaresIcr(w, icr) && Math.abs(icr.y) > 1e-9) {
      state.r = u / icr.y;
      state.v = -icr.x * state.r;
    }
    solveFixedSteer(w, u, mass, xcg, state);
    radius = Math.sqrt(u * u + state.v * state.v) / Math.abs(state.r);
  }
  const result = collect(pm, mode, turn, ctx, mirrored, 1 / Math.abs(state.r), "radian");
  result.radius = radius;
  result.steerInput = toDegrees(input);
  result.centreX = -state.v / state.r;
  result.centreY = (mirrored ? -1 : 1) * (u / state.r);
  result.lateralAcceleration = moving ? turn.speed * turn.speed * state.r : 0;
  result.converged = state.converged;
  return checkTurningRadius(pm, result);
}
