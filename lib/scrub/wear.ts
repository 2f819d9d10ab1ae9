import { GRAVITY } from "./coefficients";
import { isTracked } from "./machine-checks";
import type { PreparedAxle, PreparedMachine } from "./machine-model";
import type { TPositionResult, TStraightTravel, TSurfaceKind } from "./schemas";
import { FIELDS, F_DISTANCE, F_LAT_ENERGY, F_LON_ENERGY, type UnitTurn } from "./unit-turn";
import { type resolveSurfaces, SURFACE_KINDS } from "./surfaces";
import { POSITIONS } from "./turn-result";
import { solveWindUp } from "./wind-up";

const SURFACE_INDEX = new Map(SURFACE_KINDS.map((s, i) => [s, i]));
const S = SURFACE_KINDS.length;
/** Accumulator layout per position and surface: lateral J, longitudinal J, distance m. */
const A_LAT = 0;
const A_LON = 1;
const A_DIST = 2;

/** Per-hour energy and distance per position and surface. */
export function newWearAccumulator(): Float64Array {
  return new Float64Array(4 * S * 3);
}

/** Add `factor` (heading change × occurrences per hour) of a unit turn on one surface. */
export function accumulateTurn(
  acc: Float64Array,
  unit: UnitTurn,
  surface: TSurfaceKind,
  factor: number,
): void {
  const s = SURFACE_INDEX.get(surface) ?? 0;
  const wv = unit.wheels;
  for (let i = 0; i < 4; i++) {
    const o = i * FIELDS;
    const a = (i * S + s) * 3;
    acc[a + A_LAT] = acc[a + A_LAT]! + wv[o + F_LAT_ENERGY]! * factor;
    acc[a + A_LON] = acc[a + A_LON]! + wv[o + F_LON_ENERGY]! * factor;
    acc[a + A_DIST] = acc[a + A_DIST]! + wv[o + F_DISTANCE]! * factor;
  }
}

/** Straight travel: rolling distance per surface, plus lead wind-up when the axles are coupled. */
export function addStraightTravel(
  pm: PreparedMachine,
  straight: TStraightTravel,
  lead: number | null,
  surfaces: ReturnType<typeof resolveSurfaces>,
  coefficients: { longitudinalStiffnessCoefficient: number },
  acc: Float64Array,
): void {
  let shareSum = 0;
  for (const kind of SURFACE_KINDS) shareSum += straight.surfaceShares[kind] ?? 0;
  if (!(shareSum > 0) || !(straight.distancePerHour > 0)) return;
  const drive = pm.machine.drive;
  const coupled = lead !== null && (drive.type === "4wd" || straight.frontDrive === "engaged");
  const windUp = { frontSlip: 0, rearSlip: 0, force: 0 };
  for (const kind of SURFACE_KINDS) {
    const share = (straight.surfaceShares[kind] ?? 0) / shareSum;
    if (share <= 0) continue;
    const s = SURFACE_INDEX.get(kind) ?? 0;
    const distance = straight.distancePerHour * share;
    for (let i = 0; i < 4; i++) {
      const a = (i * S + s) * 3;
      acc[a + A_DIST] = acc[a + A_DIST]! + distance;
    }
    if (!coupled || lead === null) continue;
    const mu = surfaces[kind].friction;
    for (const [laden, part] of [
      [false, 1 - straight.ladenShare],
      [true, straight.ladenShare],
    ] as const) {
      if (part <= 0) continue;
      const nf = axleLoadN(pm.front, laden);
      const nr = axleLoadN(pm.rear, laden);
      const cx = coefficients.longitudinalStiffnessCoefficient;
      solveWindUp(lead, cx * nf, cx * nr, mu * nf, mu * nr, windUp);
      for (let i = 0; i < 4; i++) {
        const slip = i < 2 ? windUp.frontSlip : windUp.rearSlip;
        const a = (i * S + s) * 3;
        acc[a + A_LON] = acc[a + A_LON]! + (windUp.force / 2) * slip * distance * part;
      }
    }
  }
}

function axleLoadN(axle: PreparedAxle, laden: boolean): number {
  return (laden ? axle.ladenKg : axle.unladenKg) * GRAVITY;
}

/**
 * Tread loss per position (PHYSICS.md §6): scrub Δh = k_h·Σ_s a_s·E_s with
 * k_h [mm/MJ] = γ[mm³/J]·10⁶ / (RC·b_t·κ_land) unless calibrated on the machine; base
 * Δh = baseWearPerKm·Σ_s a_s·km_s.
 */
export function wearByPosition(
  pm: PreparedMachine,
  acc: Float64Array,
  surfaces: ReturnType<typeof resolveSurfaces>,
  coefficients: { abradability: number; baseWearPerKm: number; landRatio: number },
): TPositionResult[] {
  const tracked = isTracked(pm);
  return POSITIONS.map((position, i) => {
    const axle = i < 2 ? pm.front : pm.rear;
    const tyre = axle.axle.tyre;
    const calibrated = pm.machine.wearCoefficients?.[position];
    const bandArea = axle.rollingCircumference * axle.treadWidth * coefficients.landRatio;
    const kh = calibrated ?? (coefficients.abradability * 1e6) / bandArea;
    let lateral = 0;
    let longitudinal = 0;
    let weightedEnergy = 0;
    let weightedKm = 0;
    SURFACE_KINDS.forEach((kind, s) => {
      const a = (i * S + s) * 3;
      const abrasion = surfaces[kind].abrasion;
      lateral += acc[a + A_LAT]!;
      longitudinal += acc[a + A_LON]!;
      weightedEnergy += abrasion * (acc[a + A_LAT]! + acc[a + A_LON]!);
      weightedKm += (abrasion * acc[a + A_DIST]!) / 1000;
    });
    const scrubPerHour = tracked ? 0 : (kh * weightedEnergy) / 1e6;
    const basePerHour = tracked ? 0 : coefficients.baseWearPerKm * weightedKm;
    const rate = scrubPerHour + basePerHour;
    const usable = tyre.treadDepthNew - tyre.treadDepthReplace;
    const hours = rate > 0 && usable > 0 ? usable / rate : null;
    return {
      position,
      designation: axle.designation,
      energyPerHour: { lateral, longitudinal, total: lateral + longitudinal },
      wearPer100h: { base: basePerHour * 100, scrub: scrubPerHour * 100, total: rate * 100 },
      wearCoefficient: { value: kh, calibrated: calibrated !== undefined },
      hoursToReplacement: hours,
      costPerHour: hours ? tyre.price / hours : 0,
      wearsFirst: false,
    };
  });
}
