import type { PreparedMode } from "./machine-model";
import type { TSurfaceProperties, TWarningCode } from "./schemas";
import { newSolveState, type SolveState } from "./turn-solver";

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

/** Solved (left-turn) wheel order → result order for a mirrored (right) turn. */
export const MIRROR = [1, 0, 3, 2] as const;

/** A zeroed field array; filled with a non-integer first so V8 stores it as unboxed doubles. */
function newWheelFields(): number[] {
  const out = new Array<number>(4 * FIELDS);
  for (let i = 0; i < out.length; i++) out[i] = 0.5;
  for (let i = 0; i < out.length; i++) out[i] = 0;
  return out;
}

/** Shared solver state (one turn is solved at a time). */
export const state: SolveState = newSolveState();

/** A turn the machine cannot make: reported, never clamped. */
export function infeasible(
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

export function resetScratch(mode: PreparedMode, perUnit: "radian" | "metre"): UnitTurn {
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

/** Offset of wheel i (solved, left-turn order) in the result array (actual position order). */
export function slot(i: number, mirrored: boolean): number {
  return (mirrored ? (MIRROR[i] as number) : i) * FIELDS;
}
