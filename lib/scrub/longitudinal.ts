import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import {
  F_DISTANCE,
  F_LON_ENERGY,
  F_LON_SCRUB,
  slot,
  type TurnContext,
  type UnitTurn,
} from "./unit-turn";
import { solveWindUp, type WindUp } from "./wind-up";

const windUp: WindUp = { frontSlip: 0, rearSlip: 0, force: 0 };

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

/**
 * Longitudinal scrub of a solved turn: wind-up of coupled axles (lead against the required
 * front/rear speed ratio) and locked differentials. Skid steer has its own model.
 */
export function addLongitudinal(
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
