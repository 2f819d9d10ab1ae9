import { z } from "zod";
import {
  ABRADABILITY,
  BASE_WEAR_MM_PER_KM,
  GRAVITY,
  HIGH_LATERAL_ACCELERATION,
  LAND_RATIO,
  LEAD_RANGE,
  LONGITUDINAL_STIFFNESS_COEFFICIENT,
} from "./coefficients";
import { STANDING_CAUTIONS } from "./cautions";
import { toRadians } from "./angles";
import { fastTurnKind } from "./fast-turn-kind";
import { frontAxleLead } from "./front-axle-lead";
import { prepareMachine, type PreparedAxle, type PreparedMachine } from "./machine-model";
import { rotationAdvice, type PositionWear } from "./rotation";
import {
  ZDutyCycle,
  ZEstimateOptions,
  ZMachine,
  ZTurnKind,
  type TDutyCycleInput,
  type TEstimateOptions,
  type TEstimateResult,
  type TMachineInput,
  type TPosition,
  type TPositionResult,
  type TSurfaceKind,
  type TTurn,
  type TTurnResult,
  type TWarning,
  type TWheelTurnResult,
} from "./schemas";
import {
  copyUnitTurn,
  FIELDS,
  F_DISTANCE,
  F_LAT_ENERGY,
  F_LAT_SCRUB,
  F_LON_ENERGY,
  F_LON_SCRUB,
  F_PATH,
  F_SLIP,
  F_STEER,
  solveUnitTurn,
  type TurnContext,
  type UnitTurn,
} from "./solve-turn";
import { resolveSurfaces, SURFACE_KINDS } from "./surfaces";
import { ENGINE_VERSION } from "./version";
import { solveWindUp } from "./wind-up";

const CACHE_LIMIT = 4096;
/** Duty cycle with its turn kinds left unparsed (validated one at a time in the loop). */
const ZDutyCycleShell = ZDutyCycle.extend({ turns: z.array(z.unknown()) });
const NO_WHEELS: TWheelTurnResult[] = [];
Object.freeze(NO_WHEELS);
const POSITIONS: readonly TPosition[] = ["front-left", "front-right", "rear-left", "rear-right"];
const SURFACE_INDEX = new Map(SURFACE_KINDS.map((s, i) => [s, i]));
const S = SURFACE_KINDS.length;
/** Accumulator layout per position and surface: lateral J, longitudinal J, distance m. */
const A_LAT = 0;
const A_LON = 1;
const A_DIST = 2;

function parseOrExplain<T>(schema: z.ZodType<T>, value: unknown, what: string): T {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    throw new Error(`${what} is invalid:\n${z.prettifyError(parsed.error)}`, {
      cause: parsed.error,
    });
  }
  return parsed.data;
}

/** Coupled-axle lead λ (fraction) of the machine, null when front and rear are not coupled. */
function machineLead(pm: PreparedMachine): number | null {
  const drive = pm.machine.drive;
  const f = pm.front.rollingCircumference;
  const r = pm.rear.rollingCircumference;
  if (drive.type === "front-assist") {
    return frontAxleLead({
      frontCircumference: f,
      rearCircumference: r,
      gearRatio: drive.gearRatio,
    });
  }
  if (drive.type === "4wd") return (f * drive.interAxleRatio - r) / r;
  return null;
}

/**
 * Estimate scrub, wear and tyre cost per operating hour of a machine over a duty cycle.
 * Inputs are validated with the engine's zod schemas; invalid input throws an Error that lists
 * what to fix. Turns the machine cannot steer are reported (feasible: false, warning), never
 * clamped, and contribute no wear.
 */
export function estimate(
  machineInput: TMachineInput,
  dutyCycleInput: TDutyCycleInput,
  optionsInput: TEstimateOptions = {},
): TEstimateResult {
  const machine = parseOrExplain(ZMachine, machineInput, "Machine");
  // Turn kinds are validated one by one inside the loop: a million parsed copies held at once
  // would triple the live heap (and the garbage collector's work) for large imports.
  const dutyCycle = parseOrExplain(ZDutyCycleShell, dutyCycleInput, "Duty cycle");
  const turnProblems: string[] = [];
  const options = parseOrExplain(ZEstimateOptions, optionsInput, "Estimate options");
  const pm = prepareMachine(machine);
  const surfaces = resolveSurfaces(dutyCycle.surfaces);
  const coefficients = {
    abradability: options.abradability ?? ABRADABILITY,
    baseWearPerKm: options.baseWearPerKm ?? BASE_WEAR_MM_PER_KM,
    landRatio: options.landRatio ?? LAND_RATIO,
    longitudinalStiffnessCoefficient:
      options.longitudinalStiffnessCoefficient ?? LONGITUDINAL_STIFFNESS_COEFFICIENT,
  };
  const warnings: TWarning[] = [];
  const lead = machineLead(pm);
  checkMachine(pm, lead, warnings);

  const acc = new Float64Array(4 * S * 3);
  const contexts = new Map<TSurfaceKind, TurnContext>();
  const contextFor = (surface: TSurfaceKind): TurnContext => {
    let c = contexts.get(surface);
    if (!c) {
      c = {
        surface: surfaces[surface],
        lead,
        longitudinalStiffnessCoefficient: coefficients.longitudinalStiffnessCoefficient,
      };
      contexts.set(surface, c);
    }
    return c;
  };

  const cache = new TurnCache();
  const turns: TTurnResult[] = new Array(dutyCycle.turns.length);
  dutyCycle.turns.forEach((raw, index) => {
    let kind = fastTurnKind(raw);
    if (kind === undefined) {
      const parsed = ZTurnKind.safeParse(raw);
      if (!parsed.success) {
        if (turnProblems.length < 10) {
          turnProblems.push(`turns[${index}]: ${z.prettifyError(parsed.error)}`);
        } else turnProblems.push("");
        return;
      }
      kind = parsed.data;
    }
    const turn = kind.turn;
    const layout = turn.steeringMode ?? pm.defaultLayout;
    const mode = pm.modes.get(layout);
    let unit: UnitTurn | null = null;
    if (mode) {
      unit = cache.lookup(layout, turn) ?? null;
      if (unit === null) {
        unit = solveUnitTurn(pm, mode, turn, contextFor(turn.surface));
        cache.store(unit);
      }
    }
    const label = turn.label ?? (turn.direction === "left" ? "left turn" : "right turn");
    if (unit === null) {
      warnings.push({
        code: "steering-mode-missing",
        severity: "error",
        message: `Turn "${label}" asks for ${layout} steering, which this machine does not have; it is left out of the estimate.`,
        turnIndex: index,
      });
      turns[index] = emptyTurn(index, label, kind.perHour, layout);
      return;
    }
    const amount =
      unit.perUnit === "radian" ? toRadians(turn.headingChange) : (turn.crabDistance ?? 0);
    turns[index] = turnResult(index, label, kind.perHour, unit, amount, options.turnDetail);
    if (!unit.feasible) {
      warnings.push({
        code: unit.problem?.code ?? "radius-infeasible",
        severity: "error",
        message: `Turn "${label}": ${unit.problem?.message ?? "not feasible"} It is left out of the estimate.`,
        turnIndex: index,
      });
      return;
    }
    if (!unit.converged) {
      warnings.push({
        code: "solver-not-converged",
        severity: "warning",
        message: `Turn "${label}": the force balance did not fully converge; treat its scrub figures as approximate.`,
        turnIndex: index,
      });
    }
    if (Math.abs(unit.lateralAcceleration) > HIGH_LATERAL_ACCELERATION) {
      warnings.push({
        code: "high-lateral-acceleration",
        severity: "warning",
        message: `Turn "${label}": lateral acceleration ${Math.abs(unit.lateralAcceleration).toFixed(2)} m/s² at ${turn.speed} m/s; check machine stability and slow down.`,
        turnIndex: index,
      });
    }
    const s = SURFACE_INDEX.get(turn.surface) ?? 0;
    const factor = amount * kind.perHour;
    const wv = unit.wheels;
    for (let i = 0; i < 4; i++) {
      const o = i * FIELDS;
      const a = (i * S + s) * 3;
      acc[a + A_LAT] = acc[a + A_LAT]! + wv[o + F_LAT_ENERGY]! * factor;
      acc[a + A_LON] = acc[a + A_LON]! + wv[o + F_LON_ENERGY]! * factor;
      acc[a + A_DIST] = acc[a + A_DIST]! + wv[o + F_DISTANCE]! * factor;
    }
  });

  if (turnProblems.length > 0) {
    const shown = turnProblems.filter((p) => p !== "");
    const more = turnProblems.length - shown.length;
    throw new Error(
      `Duty cycle is invalid:\n${shown.join("\n")}${more > 0 ? `\n…and ${more} more invalid turns` : ""}`,
    );
  }

  addStraightTravel(pm, dutyCycle.straight, lead, surfaces, coefficients, acc);

  const positions = wearByPosition(pm, acc, surfaces, coefficients);
  let first: TPositionResult | null = null;
  for (const p of positions) {
    if (
      p.hoursToReplacement !== null &&
      (!first || p.hoursToReplacement < first.hoursToReplacement!)
    ) {
      first = p;
    }
  }
  if (first) first.wearsFirst = true;
  const rotation = rotationAdvice(
    positions.map<PositionWear>((p, i) => {
      const axle = i < 2 ? pm.front : pm.rear;
      return {
        position: p.position,
        designation: p.designation,
        rate: p.wearPer100h.total / 100,
        usable: axle.axle.tyre.treadDepthNew - axle.axle.tyre.treadDepthReplace,
      };
    }),
  );
  return {
    engineVersion: ENGINE_VERSION,
    machineName: machine.name,
    dutyCycleName: dutyCycle.name,
    lead,
    positions,
    turns,
    firstToWear: first?.position ?? null,
    rotation: pm.machine.steering.layout === "skid" && isTracked(pm) ? [] : rotation,
    costPerHour: positions.reduce((sum, p) => sum + p.costPerHour, 0),
    warnings,
    cautions: [...STANDING_CAUTIONS],
    coefficients,
  };
}

function isTracked(pm: PreparedMachine): boolean {
  return pm.machine.steering.layout === "skid" && pm.machine.steering.running === "tracked";
}

const LAYOUT_CODES = new Map<string, number>(
  [
    "ideal",
    "trapezoid",
    "parallel",
    "turntable",
    "articulated",
    "rear",
    "four-wheel",
    "crab",
    "skid",
  ].map((l, i) => [l, i]),
);

/**
 * Solved turns keyed by everything that changes the solve (not heading change, count, crab
 * distance or label: results scale linearly with those). Direct-mapped and fixed-size, with the
 * full key compared exactly: a collision or eviction only re-solves, deterministically, to the
 * same result, so memory stays flat for huge imported duty cycles without strings or maps.
 */
class TurnCache {
  private readonly codes = new Int32Array(CACHE_LIMIT).fill(-1);
  private readonly sizes = new Float64Array(CACHE_LIMIT);
  private readonly speeds = new Float64Array(CACHE_LIMIT);
  private readonly units: (UnitTurn | undefined)[] = new Array<UnitTurn | undefined>(
    CACHE_LIMIT,
  ).fill(undefined);
  private readonly bits = new Float64Array(2);
  private readonly words = new Uint32Array(this.bits.buffer);
  private index = 0;
  private seen = false;

  private code(layout: string, t: TTurn): number {
    let c = LAYOUT_CODES.get(layout) ?? 15;
    c = c * 2 + (t.direction === "left" ? 0 : 1);
    c = c * 2 + (t.radius === undefined ? 0 : 1);
    c = c * 8 + (SURFACE_INDEX.get(t.surface) ?? 7);
    c = c * 2 + (t.loadState === "laden" ? 1 : 0);
    c = c * 2 + (t.frontDrive === "engaged" ? 1 : 0);
    return c * 2 + (t.differentialLock ? 1 : 0);
  }

  /**
   * The cached solve for this turn, or undefined. Remembers the slot for {@link store}; a turn
   * is kept only from its second occurrence on, so all-distinct imports allocate nothing here.
   */
  lookup(layout: string, t: TTurn): UnitTurn | undefined {
    const code = this.code(layout, t);
    const size = t.radius ?? t.steerInput ?? 0;
    this.bits[0] = size;
    this.bits[1] = t.speed;
    const w = this.words;
    let h = Math.imul(code + 0x9e3779b9, 0x85ebca6b);
    for (let i = 0; i < 4; i++) h = Math.imul(h ^ (w[i] as number), 0xc2b2ae35) ^ (h >>> 15);
    const i = (h >>> 0) % CACHE_LIMIT;
    this.index = i;
    this.seen = this.codes[i] === code && this.sizes[i] === size && this.speeds[i] === t.speed;
    if (this.seen) return this.units[i];
    this.codes[i] = code;
    this.sizes[i] = size;
    this.speeds[i] = t.speed;
    this.units[i] = undefined;
    return undefined;
  }

  /** After a miss: keep a copy if this turn kind was seen before. */
  store(unit: UnitTurn): void {
    if (this.seen) this.units[this.index] = copyUnitTurn(unit);
  }
}

function emptyTurn(
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

function turnResult(
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

function checkMachine(pm: PreparedMachine, lead: number | null, warnings: TWarning[]): void {
  if (pm.machine.drive.type === "front-assist" && lead !== null) {
    if (lead < LEAD_RANGE.min || lead > LEAD_RANGE.max) {
      warnings.push({
        code: "lead-out-of-range",
        severity: "warning",
        message: `Front-axle lead is ${(lead * 100).toFixed(1)} %, outside the common ${LEAD_RANGE.min * 100}–${LEAD_RANGE.max * 100} % band: expect extra tyre and driveline wear. Check the tyre sizes against the tractor maker's lead table.`,
      });
    }
  }
  for (const axle of [pm.front, pm.rear]) {
    const capacity = axle.axle.tyre.loadCapacity;
    if (axle.designationUnparsed) {
      warnings.push({
        code: "designation-unparsed",
        severity: "info",
        message: `${axle.name} axle: size "${axle.designation}" was not recognised; the data-book diameter and width entered were used.`,
      });
    }
    if (capacity === undefined) continue;
    for (const [state, kg] of [
      ["unladen", axle.unladenKg],
      ["laden", axle.ladenKg],
    ] as const) {
      const wheelKg = kg * Math.max(axle.leftShare, 1 - axle.leftShare);
      if (wheelKg > capacity) {
        warnings.push({
          code: "load-over-capacity",
          severity: "error",
          message: `${axle.name} axle (${state}): ${wheelKg.toFixed(0)} kg per tyre exceeds the declared ${capacity} kg capacity. Fit tyres rated for the load at the working speed and pressure.`,
        });
        if (axle.ladenKg === axle.unladenKg) break;
      }
    }
  }
  if (isTracked(pm)) {
    warnings.push({
      code: "tracks-wear-not-modelled",
      severity: "info",
      message:
        "Tracked machine: turning energy and scrub are estimated, but track wear life and cost are not modelled.",
    });
  }
}

/** Straight travel: rolling distance per surface, plus lead wind-up when the axles are coupled. */
function addStraightTravel(
  pm: PreparedMachine,
  straight: z.infer<typeof ZDutyCycle>["straight"],
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
function wearByPosition(
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
