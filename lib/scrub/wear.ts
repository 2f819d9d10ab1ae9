import { GRAVITY, LOAD_REFERENCE_RATIO } from "./coefficients";
import { isTracked } from "./machine-checks";
import type { PreparedAxle, PreparedMachine } from "./machine-model";
import type { TPositionResult, TStraightTravel, TSurfaceKind } from "./schemas";
import { FIELDS, F_DISTANCE, F_LAT_ENERGY, F_LON_ENERGY, type UnitTurn } from "./unit-turn";
import { type resolveSurfaces, SURFACE_KINDS } from "./surfaces";
import { POSITIONS } from "./turn-result";
import { solveWindUp } from "./wind-up";

const SURFACE_INDEX = new Map(SURFACE_KINDS.map((s, i) => [s, i]));
const S = SURFACE_KINDS.length;
/** Accumulator layout per position and surface: lateral J, longitudinal J, distance m, traction J. */
const A_LAT = 0;
const A_LON = 1;
const A_DIST = 2;
const A_TRAC = 3;
const STRIDE = 4;

/** Per-hour energy and distance per position and surface. */
export function newWearAccumulator(): Float64Array {
  return new Float64Array(4 * S * STRIDE);
}

/** Add traction-slip energy (J per hour) of one wheel on one surface. */
export function addTraction(
  acc: Float64Array,
  wheel: number,
  surface: TSurfaceKind,
  joules: number,
): void {
  const a = (wheel * S + (SURFACE_INDEX.get(surface) ?? 0)) * STRIDE;
  acc[a + A_TRAC] = acc[a + A_TRAC]! + joules;
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
    const a = (i * S + s) * STRIDE;
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
      const a = (i * S + s) * STRIDE;
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
        const a = (i * S + s) * STRIDE;
        acc[a + A_LON] = acc[a + A_LON]! + (windUp.force / 2) * slip * distance * part;
      }
    }
  }
}

function axleLoadN(axle: PreparedAxle, laden: boolean): number {
  return (laden ? axle.ladenKg : axle.unladenKg) * GRAVITY;
}

/**
 * Wheel load over the tyre's rated load at its pressure, distance-weighted over unladen and
 * laden travel: φ = Σ part·(W/W_rated)^n is the base-wear load factor; the plain ratio (n = 1)
 * is reported.
 */
function loadFactor(
  axle: PreparedAxle,
  side: number,
  ladenShare: number,
  exponent: number,
): { ratio: number; factor: number } {
  let ratio = 0;
  let factor = 0;
  for (const [kg, part] of [
    [axle.unladenKg, 1 - ladenShare],
    [axle.ladenKg, ladenShare],
  ] as const) {
    if (part <= 0) continue;
    const r = (kg * side) / axle.ratedLoadKg;
    ratio += r * part;
    factor += Math.pow(r / LOAD_REFERENCE_RATIO, exponent) * part;
  }
  return { ratio, factor };
}

/**
 * Tread loss per position (PHYSICS.md §6): scrub and traction Δh = k_h·Σ_s a_s·E_s with
 * k_h [mm/MJ] = γ[mm³/J]·10⁶ / (RC·b_t·κ_land) unless calibrated on the machine; base
 * Δh = baseWearPerKm·(W/W_rated)^n·Σ_s a_s·km_s (Archard with squirm ∝ deflection).
 */
export function wearByPosition(
  pm: PreparedMachine,
  acc: Float64Array,
  surfaces: ReturnType<typeof resolveSurfaces>,
  coefficients: {
    abradability: number;
    baseWearPerKm: number;
    landRatio: number;
    loadWearExponent: number;
  },
  ladenShare: number,
): TPositionResult[] {
  const tracked = isTracked(pm);
  return POSITIONS.map((position, i) => {
    const axle = i < 2 ? pm.front : pm.rear;
    const side = i % 2 === 0 ? axle.leftShare : 1 - axle.leftShare;
    const load = loadFactor(axle, side, ladenShare, coefficients.loadWearExponent);
    const tyre = axle.axle.tyre;
    const calibrated = pm.machine.wearCoefficients?.[position];
    const bandArea = axle.rollingCircumference * axle.treadWidth * coefficients.landRatio;
    const kh = calibrated ?? (coefficients.abradability * 1e6) / bandArea;
    let lateral = 0;
    let longitudinal = 0;
    let traction = 0;
    let weightedEnergy = 0;
    let weightedTraction = 0;
    let weightedKm = 0;
    SURFACE_KINDS.forEach((kind, s) => {
      const a = (i * S + s) * STRIDE;
      const abrasion = surfaces[kind].abrasion;
      lateral += acc[a + A_LAT]!;
      longitudinal += acc[a + A_LON]!;
      traction += acc[a + A_TRAC]!;
      weightedTraction += abrasion * acc[a + A_TRAC]!;
      weightedEnergy += abrasion * (acc[a + A_LAT]! + acc[a + A_LON]!);
      weightedKm += (abrasion * acc[a + A_DIST]!) / 1000;
    });
    const scrubPerHour = tracked ? 0 : (kh * weightedEnergy) / 1e6;
    const tractionPerHour = tracked ? 0 : (kh * weightedTraction) / 1e6;
    const basePerHour = tracked ? 0 : coefficients.baseWearPerKm * load.factor * weightedKm;
    const rate = scrubPerHour + tractionPerHour + basePerHour;
    const usable = tyre.treadDepthNew - tyre.treadDepthReplace;
    const hours = rate > 0 && usable > 0 ? usable / rate : null;
    return {
      position,
      designation: axle.designation,
      energyPerHour: { lateral, longitudinal, traction, total: lateral + longitudinal + traction },
      wearPer100h: {
        base: basePerHour * 100,
        scrub: scrubPerHour * 100,
        traction: tractionPerHour * 100,
        total: rate * 100,
      },
      loadRatio: load.ratio,
      wearCoefficient: { value: kh, calibrated: calibrated !== undefined },
      hoursToReplacement: hours,
      costPerHour: hours ? tyre.price / hours : 0,
      wearsFirst: false,
    };
  });
}
