import type { TPosition, TTurnResult, TWheelTurnResult } from "./schemas";
import {
  FIELDS,
  F_LAT_ENERGY,
  F_LAT_SCRUB,
  F_LON_ENERGY,
  F_LON_SCRUB,
  F_PATH,
  F_SLIP,
  F_STEER,
  type UnitTurn,
} from "./unit-turn";

export const POSITIONS: readonly TPosition[] = [
  "front-left",
  "front-right",
  "rear-left",
  "rear-right",
];
/** Shared, frozen: turns without per-wheel detail all point at it. */
const NO_WHEELS: TWheelTurnResult[] = [];
Object.freeze(NO_WHEELS);

/** Result row of a turn the machine has no steering mode for. */
export function emptyTurn(
  index: number,
  label: string,
  perHour: number,
  layout: TTurnResult["steeringMode"],
): TTurnResult {
  return {
    index,
    label,
    perHour,
    feasible: false,
    steeringMode: layout,
    radius: NaN,
    steerInput: NaN,
    turningCentre: null,
    turningDiameter: null,
    lateralAcceleration: 0,
    effectiveLead: null,
    turningMoment: null,
    wheels: NO_WHEELS,
    energy: 0,
  };
}

function finite(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}

function wheelResult(wv: number[], i: number, amount: number): TWheelTurnResult {
  const o = i * FIELDS;
  const lateralEnergy = wv[o + F_LAT_ENERGY]! * amount;
  const longitudinalEnergy = wv[o + F_LON_ENERGY]! * amount;
  return {
    position: POSITIONS[i]!,
    steerAngle: wv[o + F_STEER]!,
    slipAngle: wv[o + F_SLIP]!,
    pathRadius: finite(wv[o + F_PATH]!),
    lateralScrub: wv[o + F_LAT_SCRUB]! * amount,
    longitudinalScrub: wv[o + F_LON_SCRUB]! * amount,
    lateralEnergy,
    longitudinalEnergy,
    energy: lateralEnergy + longitudinalEnergy,
  };
}

/** Result row of one turn kind: a unit solve scaled by heading change (or crab distance). */
export function turnResult(
  index: number,
  label: string,
  perHour: number,
  unit: UnitTurn,
  amount: number,
  detail: boolean,
): TTurnResult {
  const wv = unit.wheels;
  let energy = 0;
  for (let i = 0; i < 4; i++) {
    const o = i * FIELDS;
    energy += (wv[o + F_LAT_ENERGY]! + wv[o + F_LON_ENERGY]!) * amount;
  }
  const wheels =
    detail && unit.feasible
      ? [
          wheelResult(wv, 0, amount),
          wheelResult(wv, 1, amount),
          wheelResult(wv, 2, amount),
          wheelResult(wv, 3, amount),
        ]
      : NO_WHEELS;
  return {
    index,
    label,
    perHour,
    feasible: unit.feasible,
    steeringMode: unit.layout,
    radius: unit.radius,
    steerInput: unit.steerInput,
    turningCentre:
      unit.feasible && Number.isFinite(unit.centreX) ? { x: unit.centreX, y: unit.centreY } : null,
    turningDiameter: unit.feasible ? unit.turningDiameter : null,
    lateralAcceleration: unit.lateralAcceleration,
    effectiveLead: unit.effectiveLead,
    turningMoment: unit.turningMoment,
    wheels,
    energy: unit.feasible ? energy : 0,
  };
}
