import { DEG, toDegrees, toRadians } from "./angles";
import { articulatedRadii, articulationForRearRadius } from "./articulated-radii";
import { GRAVITY, SKID_EFFECTIVE_TRACK_FACTOR, TRACK_STIFFNESS_COEFFICIENT } from "./coefficients";
import { leastSquaresIcr } from "./least-squares-icr";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TSurfaceProperties, TTurn, TWarningCode } from "./schemas";
import { ackermannOuterRad } from "./steer-maps";
import {
  newSolveState,
  solveAtRadius,
  solveFixedSteer,
  solveLateral,
  type SolveState,
} from "./turn-solver";
import { solveWindUp, type WindUp } from "./wind-up";

/**
 * Per-wheel fields of a unit turn result, 4 wheels × FIELDS in one plain number array (small
 * typed arrays are allocated off-heap in V8 and are slow to create by the million).
 */
export const F_STEER = 0; // deg
export const F_SLIP = 1; // deg
export const F_PATH = 2; // m, NaN in crab
export const F_LAT_SCRUB = 3; // m per unit
export const F_LON_SCRUB = 4; // m per unit
export const F_LAT_ENERGY = 5; // J per unit
export const F_LON_ENERGY = 6; // J per unit
export const F_DISTANCE = 7; // m rolled per unit
export const FIELDS = 8;

/**
 * One solved turn per unit of motion: per radian of heading change, or per metre of travel for
 * crab traverses. Scrub and energy are linear in the heading change (steady turn), so one solve
 * serves every turn kind that differs only in heading change, count or label.
 */
export interface UnitTurn {
  feasible: boolean;
  problem: { code: TWarningCode; message: string } | null;
  perUnit: "radian" | "metre";
  layout: PreparedMode["layout"];
  radius: number;
  steerInput: number;
  /** Turning centre in the body frame (m); NaN when there is none (crab, infeasible). */
  centreX: number;
  centreY: number;
  turningDiameter: number | null;
  lateralAcceleration: number;
  effectiveLead: number | null;
  turningMoment: number | null;
  converged: boolean;
  wheels: number[];
}

/** What a turn solve needs besides the machine. */
export interface TurnContext {
  surface: TSurfaceProperties;
  /** Machine lead λ of the coupled drive (fraction), null when the axles are not coupled. */
  lead: number | null;
  longitudinalStiffnessCoefficient: number;
}

const MIRROR = [1, 0, 3, 2] as const;

function newWheelFields(): number[] {
  const out = new Array<number>(4 * FIELDS);
  for (let i = 0; i < out.length; i++) out[i] = 0.5;
  for (let i = 0; i < out.length; i++) out[i] = 0;
  return out;
}
export const state: SolveState = newSolveState();
const windUp: WindUp = { frontSlip: 0, rearSlip: 0, force: 0 };
const icr = { x: 0, y: 0 };
const loadsN = new Float64Array(4);

function infeasible(
  mode: PreparedMode,
  radius: number,
  steerInput: number,
  code: TWarningCode,
  message: string,
): UnitTurn {
  const result = resetScratch(mode, "radian");
  result.feasible = false;
  result.problem = { code, message };
  result.radius = radius;
  result.steerInput = steerInput;
  return result;
}

/**
 * The solvers write into one reusable result (no allocation per solve): callers use it before
 * the next solve, or keep a {@link copyUnitTurn}.
 */
const SCRATCH: UnitTurn = {
  feasible: true,
  problem: null,
  perUnit: "radian",
  layout: "ideal",
  radius: NaN,
  steerInput: NaN,
  centreX: NaN,
  centreY: NaN,
  turningDiameter: null,
  lateralAcceleration: 0,
  effectiveLead: null,
  turningMoment: null,
  converged: true,
  wheels: newWheelFields(),
};

function resetScratch(mode: PreparedMode, perUnit: "radian" | "metre"): UnitTurn {
  const r = SCRATCH;
  r.feasible = true;
  r.problem = null;
  r.perUnit = perUnit;
  r.layout = mode.layout;
  r.radius = NaN;
  r.steerInput = NaN;
  r.centreX = NaN;
  r.centreY = NaN;
  r.turningDiameter = null;
  r.lateralAcceleration = 0;
  r.effectiveLead = null;
  r.turningMoment = null;
  r.converged = true;
  const w = r.wheels;
  for (let i = 0; i < w.length; i++) w[i] = 0;
  return r;
}

export function copyUnitTurn(u: UnitTurn): UnitTurn {
  return { ...u, wheels: u.wheels.slice() };
}

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

function checkTurningRadius(pm: PreparedMachine, result: UnitTurn): UnitTurn {
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
function collect(
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

function frontDriven(pm: PreparedMachine, turn: TTurn): boolean {
  const drive = pm.machine.drive;
  if (drive.type === "2wd") return drive.drivenAxle === "front";
  if (drive.type === "front-assist") return turn.frontDrive === "engaged";
  return true;
}

function rearDriven(pm: PreparedMachine): boolean {
  const drive = pm.machine.drive;
  return drive.type !== "2wd" || drive.drivenAxle === "rear";
}

/** Offset of wheel i (solved, left-turn order) in the result array (actual position order). */
function slot(i: number, mirrored: boolean): number {
  return (mirrored ? (MIRROR[i] as number) : i) * FIELDS;
}

function addLongitudinal(
  pm: PreparedMachine,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
  result: UnitTurn,
): void {
  if (result.layout === "skid") return;
  const out = result.wheels;
  const w = pm.modes.get(result.layout)!.wheels;
  const front = frontDriven(pm, turn);
  const rear = rearDriven(pm);
  const cx = ctx.longitudinalStiffnessCoefficient;
  // Coupled axles: wind-up from the mismatch between lead and the required speed ratio.
  if (front && rear && ctx.lead !== null) {
    const frontPath = out[slot(0, mirrored) + F_DISTANCE]! + out[slot(1, mirrored) + F_DISTANCE]!;
    const rearPath = out[slot(2, mirrored) + F_DISTANCE]! + out[slot(3, mirrored) + F_DISTANCE]!;
    const required = frontPath / rearPath;
    const mismatch = (1 + ctx.lead) / required - 1;
    result.effectiveLead = mismatch;
    const nFront = (w.load[0] as number) + (w.load[1] as number);
    const nRear = (w.load[2] as number) + (w.load[3] as number);
    const mu = ctx.surface.friction;
    solveWindUp(mismatch, cx * nFront, cx * nRear, mu * nFront, mu * nRear, windUp);
    for (let i = 0; i < 4; i++) {
      const o = slot(i, mirrored);
      const slip = i < 2 ? windUp.frontSlip : windUp.rearSlip;
      const scrub = slip * out[o + F_DISTANCE]!;
      out[o + F_LON_SCRUB] = out[o + F_LON_SCRUB]! + scrub;
      out[o + F_LON_ENERGY] = out[o + F_LON_ENERGY]! + (windUp.force / 2) * scrub;
    }
  }
  // Locked differentials: both wheels of a driven axle turn at the axle's mean speed.
  if (turn.differentialLock) {
    if (front) lockAxle(w, out, 0, 1, mirrored, ctx);
    if (rear) lockAxle(w, out, 2, 3, mirrored, ctx);
  }
}

/**
 * Locked differential [C]: each wheel runs at slip κ = |d̄ − d|/d against its own path d;
 * force min(C_x κ, μN), energy F·κ·d.
 */
function lockAxle(
  w: PreparedMode["wheels"],
  out: number[],
  a: number,
  b: number,
  mirrored: boolean,
  ctx: TurnContext,
): void {
  const mean = (out[slot(a, mirrored) + F_DISTANCE]! + out[slot(b, mirrored) + F_DISTANCE]!) / 2;
  for (let i = a; i <= b; i++) {
    const o = slot(i, mirrored);
    const d = out[o + F_DISTANCE]!;
    if (!(d > 0)) continue;
    const kappa = Math.abs(mean - d) / d;
    const load = w.load[i] as number;
    const force = Math.min(
      ctx.longitudinalStiffnessCoefficient * load * kappa,
      ctx.surface.friction * load,
    );
    const scrub = kappa * d;
    out[o + F_LON_SCRUB] = out[o + F_LON_SCRUB]! + scrub;
    out[o + F_LON_ENERGY] = out[o + F_LON_ENERGY]! + force * scrub;
  }
}

/**
 * Articulated: each solid axle's spin axis passes through the turning centre, so there is no
 * slip at low speed (PHYSICS.md §2). Reference point = rear-axle centre. The speed term uses the
 * single-track approximation of §5.6 per axle (α = F/C, E' = F²/C). 4WD mismatch R_f/R_r − 1
 * enters through the wind-up model.
 */
function articulatedTurn(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
  mass: number,
): UnitTurn {
  if (mode.steering.layout !== "articulated") throw new Error("articulated mode expected");
  const { frontLength, rearLength } = mode.steering;
  let gamma: number;
  if (turn.radius !== undefined) {
    gamma =
      turn.radius > 0 ? articulationForRearRadius(frontLength, rearLength, turn.radius) : Math.PI;
    if (!(gamma <= mode.maxInput + 1e-9)) {
      return infeasible(
        mode,
        turn.radius,
        toDegrees(gamma),
        "radius-infeasible",
        `Radius ${turn.radius} m needs ${toDegrees(gamma).toFixed(1)}° of articulation; the machine allows ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
  } else {
    gamma = toRadians(turn.steerInput ?? 0);
    if (!(gamma > 0) || gamma > mode.maxInput + 1e-9) {
      return infeasible(
        mode,
        NaN,
        turn.steerInput ?? 0,
        "steer-input-infeasible",
        `Articulation ${turn.steerInput}° must be above 0° and within the machine's ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
  }
  const radii = articulatedRadii({ frontLength, rearLength, articulation: gamma / DEG });
  const w = mode.wheels;
  const omega2 = mass > 0 ? (turn.speed / radii.rear) ** 2 : 0;
  const axleRadius = [radii.front, radii.front, radii.rear, radii.rear];
  const halfTrack = [pm.front.track / 2, pm.front.track / 2, pm.rear.track / 2, pm.rear.track / 2];
  for (let i = 0; i < 4; i++) {
    const rho = (axleRadius[i] as number) + (i % 2 === 0 ? -1 : 1) * (halfTrack[i] as number);
    // Centripetal force share of this wheel: m_i ω² ρ_i; linear slip σ = F/C.
    const force = ((w.load[i] as number) / GRAVITY) * omega2 * rho;
    const sigma = force / (w.stiffness[i] as number);
    w.sigma[i] = sigma;
    w.force[i] = force;
    w.setSteer(i, i < 2 ? gamma : 0);
    w.rollingSpeed[i] = rho / Math.sqrt(1 + sigma * sigma);
    w.lateralSpeed[i] = (rho * sigma) / Math.sqrt(1 + sigma * sigma);
  }
  const result = collect(pm, mode, turn, ctx, mirrored, 1, "radian");
  result.radius = radii.rear;
  result.steerInput = toDegrees(gamma);
  result.centreX = 0;
  result.centreY = (mirrored ? -1 : 1) * radii.rear;
  result.lateralAcceleration = mass > 0 ? turn.speed ** 2 / radii.rear : 0;
  return checkTurningRadius(pm, result);
}

/** Crab traverse: all wheels steered one way, yaw rate 0; solve the travel direction. */
function crabTurn(
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
function skidTurn(
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
