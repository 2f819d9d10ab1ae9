import { z } from "zod";
import { toRadians } from "./angles";
import { cautionsFor } from "./cautions";
import {
  ABRADABILITY,
  BASE_WEAR_MM_PER_KM,
  HIGH_LATERAL_ACCELERATION,
  LAND_RATIO,
  LOAD_WEAR_EXPONENT,
  LONGITUDINAL_STIFFNESS_COEFFICIENT,
} from "./coefficients";
import { fastTurnKind } from "./fast-turn-kind";
import { checkMachine, isTracked, machineLead } from "./machine-checks";
import { prepareMachine } from "./machine-model";
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
  type TPositionResult,
  type TSurfaceKind,
  type TTurnResult,
  type TWarning,
} from "./schemas";
import { solveUnitTurn } from "./solve-turn";
import { type TurnContext, type UnitTurn } from "./unit-turn";
import { resolveSurfaces } from "./surfaces";
import { TurnCache } from "./turn-cache";
import { emptyTurn, turnResult } from "./turn-result";
import { ENGINE_VERSION } from "./version";
import { straightTraction } from "./straight-traction";
import { SURFACE_KINDS } from "./surfaces";
import {
  accumulateTurn,
  addStraightTravel,
  addTraction,
  newWearAccumulator,
  wearByPosition,
} from "./wear";

/** Duty cycle with its turn kinds left unparsed (validated one at a time in the loop). */
const ZDutyCycleShell = ZDutyCycle.extend({ turns: z.array(z.unknown()) });

function parseOrExplain<T>(schema: z.ZodType<T>, value: unknown, what: string): T {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    throw new Error(`${what} is invalid:\n${z.prettifyError(parsed.error)}`, {
      cause: parsed.error,
    });
  }
  return parsed.data;
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
  const fitted = options.wearCoefficients ?? {};
  const coefficients = {
    abradability: fitted.abradability ?? options.abradability ?? ABRADABILITY,
    baseWearPerKm: fitted.baseWearPerKm ?? options.baseWearPerKm ?? BASE_WEAR_MM_PER_KM,
    landRatio: fitted.landRatio ?? options.landRatio ?? LAND_RATIO,
    longitudinalStiffnessCoefficient:
      fitted.longitudinalStiffnessCoefficient ??
      options.longitudinalStiffnessCoefficient ??
      LONGITUDINAL_STIFFNESS_COEFFICIENT,
    loadWearExponent: fitted.loadWearExponent ?? LOAD_WEAR_EXPONENT,
  };
  const warnings: TWarning[] = [];
  const lead = machineLead(pm);
  checkMachine(pm, lead, warnings);

  const acc = newWearAccumulator();
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
    accumulateTurn(acc, unit, turn.surface, amount * kind.perHour);
  });

  if (turnProblems.length > 0) {
    const shown = turnProblems.filter((p) => p !== "");
    const more = turnProblems.length - shown.length;
    throw new Error(
      `Duty cycle is invalid:\n${shown.join("\n")}${more > 0 ? `\n…and ${more} more invalid turns` : ""}`,
    );
  }

  addStraightTravel(pm, dutyCycle.straight, lead, surfaces, coefficients, acc);
  straightTraction(
    pm,
    dutyCycle.straight,
    surfaces,
    SURFACE_KINDS,
    coefficients.longitudinalStiffnessCoefficient,
    warnings,
    (wheel, surface, joules) => addTraction(acc, wheel, surface, joules),
  );

  const positions = wearByPosition(pm, acc, surfaces, coefficients, dutyCycle.straight.ladenShare);
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
    cautions: cautionsFor(pm.machine, lead),
    coefficients,
  };
}
