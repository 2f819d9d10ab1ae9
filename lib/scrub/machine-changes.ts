/**
 * Machine (and duty-cycle) variants for comparisons and sweeps: one named change at a time,
 * applied to a validated copy. Pure; never mutates its inputs.
 */
import { z } from "zod";
import { prepareMachine } from "./machine-model";
import {
  ZMachine,
  ZSteering,
  ZTyreFitment,
  type TDutyCycleInput,
  type TMachine,
  type TMachineInput,
} from "./schemas";

/** Parameters a sweep can vary (and a comparison option can set). */
export const SWEEP_PARAMETERS = [
  "armAngle",
  "frontTrack",
  "rearTrack",
  "lead",
  "hingePosition",
  "rearSteerRatio",
  "inflationPressure",
] as const;
export const ZSweepParameter = z.enum(SWEEP_PARAMETERS);
export type TSweepParameter = z.infer<typeof ZSweepParameter>;

/** Unit of each parameter's values, for labels. */
export const SWEEP_PARAMETER_UNITS: Record<TSweepParameter, string> = {
  armAngle: "deg",
  frontTrack: "m",
  rearTrack: "m",
  lead: "%",
  hingePosition: "share",
  rearSteerRatio: "ratio",
  inflationPressure: "kPa",
};

const ZAxleName = z.enum(["front", "rear"]);

/** One change a dealer can make to the machine or the way it is driven. */
export const ZMachineChange = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("parameter"),
    parameter: ZSweepParameter,
    value: z.number(),
    /** inflationPressure only: which axle (both when omitted). */
    axle: ZAxleName.optional(),
  }),
  /** Another steering layout or linkage (replaces the default mode). */
  z.object({ kind: z.literal("steering"), steering: ZSteering }),
  /** Another tyre fitment on one axle, with its pressure rating when known. */
  z.object({
    kind: z.literal("tyres"),
    axle: ZAxleName,
    tyre: ZTyreFitment,
    inflation: z
      .object({ pressure: z.number().positive(), ratedLoad: z.number().positive() })
      .optional(),
  }),
  /** Inflation pressure and the rated load at it on one axle. */
  z.object({
    kind: z.literal("inflation"),
    axle: ZAxleName,
    pressure: z.number().positive().max(1000),
    ratedLoad: z.number().positive(),
  }),
  /** Ballast per axle (kg), replacing what the machine carries. */
  z.object({
    kind: z.literal("ballast"),
    front: z.number().nonnegative(),
    rear: z.number().nonnegative(),
  }),
  /** Front-wheel assist engaged or not in turns (front-assist drive). */
  z.object({ kind: z.literal("front-assist-in-turns"), engaged: z.boolean() }),
]);
export type TMachineChange = z.infer<typeof ZMachineChange>;

/**
 * Rated load at another pressure from the one known point: W ∝ p^0.585, the pressure exponent of
 * the tyre-industry load formula [M: Tire and Rim Association load formula; verify]. Between
 * table points the maker's table governs.
 */
export const PRESSURE_LOAD_EXPONENT = 0.585;

export function ratedLoadAtPressure(
  known: { pressure: number; ratedLoad: number },
  pressure: number,
): number {
  return known.ratedLoad * Math.pow(pressure / known.pressure, PRESSURE_LOAD_EXPONENT);
}

export interface TVariant {
  machine: TMachine;
  dutyCycle: TDutyCycleInput;
}

function clone<T>(value: T): T {
  return structuredClone(value);
}

/** The current value of a sweep parameter on a machine; throws when it does not apply. */
export function parameterValue(
  machineInput: TMachineInput | TMachine,
  parameter: TSweepParameter,
  axle?: "front" | "rear",
): number {
  const m = ZMachine.parse(machineInput);
  switch (parameter) {
    case "armAngle":
      if (m.steering.layout !== "trapezoid") throw notApplicable(parameter, m);
      return m.steering.armAngle;
    case "frontTrack":
      return m.axles.front.track;
    case "rearTrack":
      return m.axles.rear.track;
    case "lead": {
      const pm = prepareMachine(m);
      const f = pm.front.rollingCircumference;
      const r = pm.rear.rollingCircumference;
      if (m.drive.type === "front-assist") return ((f * m.drive.gearRatio - r) / r) * 100;
      if (m.drive.type === "4wd") return ((f * m.drive.interAxleRatio - r) / r) * 100;
      throw notApplicable(parameter, m);
    }
    case "hingePosition":
      if (m.steering.layout !== "articulated") throw notApplicable(parameter, m);
      return m.steering.frontLength / (m.steering.frontLength + m.steering.rearLength);
    case "rearSteerRatio": {
      const mode = [m.steering, ...m.otherSteeringModes].find((s) => s.layout === "four-wheel");
      if (mode?.layout !== "four-wheel") throw notApplicable(parameter, m);
      return mode.rearRatio;
    }
    case "inflationPressure": {
      const inflation = m.axles[axle ?? "front"].inflation ?? m.axles.rear.inflation;
      if (!inflation) throw noInflation();
      return inflation.pressure;
    }
  }
}

function notApplicable(parameter: TSweepParameter, m: TMachine): Error {
  return new Error(
    `${parameter} does not apply to this machine (${m.steering.layout} steering, ${m.drive.type} drive).`,
  );
}

function noInflation(): Error {
  return new Error(
    "Inflation pressure can only be varied once an axle has its working pressure and the tyre's rated load at that pressure entered.",
  );
}

/** Apply one change to a validated machine copy (and the duty cycle when the change concerns driving). */
export function applyChange(variant: TVariant, change: TMachineChange): TVariant {
  const machine = clone(variant.machine);
  let dutyCycle = variant.dutyCycle;
  switch (change.kind) {
    case "parameter":
      setParameter(machine, change.parameter, change.value, change.axle);
      break;
    case "steering":
      machine.steering = ZSteering.parse(change.steering);
      machine.otherSteeringModes = machine.otherSteeringModes.filter(
        (s) => s.layout !== machine.steering.layout,
      );
      break;
    case "tyres":
      machine.axles[change.axle].tyre = ZTyreFitment.parse(change.tyre);
      machine.axles[change.axle].inflation = change.inflation;
      break;
    case "inflation":
      machine.axles[change.axle].inflation = {
        pressure: change.pressure,
        ratedLoad: change.ratedLoad,
      };
      break;
    case "ballast":
      machine.ballast = { front: change.front, rear: change.rear };
      break;
    case "front-assist-in-turns":
      if (machine.drive.type !== "front-assist") {
        throw new Error("Front-wheel assist in turns applies to front-assist drive only.");
      }
      dutyCycle = {
        ...dutyCycle,
        turns: dutyCycle.turns.map((k) => ({
          ...k,
          turn: { ...k.turn, frontDrive: change.engaged ? "engaged" : "disengaged" },
        })),
      };
      break;
  }
  return { machine: ZMachine.parse(machine), dutyCycle };
}

function setParameter(
  m: TMachine,
  parameter: TSweepParameter,
  value: number,
  axle?: "front" | "rear",
): void {
  switch (parameter) {
    case "armAngle":
      if (m.steering.layout !== "trapezoid") throw notApplicable(parameter, m);
      m.steering.armAngle = value;
      return;
    case "frontTrack":
    case "rearTrack": {
      const a = m.axles[parameter === "frontTrack" ? "front" : "rear"];
      // The steering pivots move out with the wheels (same scrub radius).
      if (a.pivotTrack !== undefined) a.pivotTrack += value - a.track;
      a.track = value;
      return;
    }
    case "lead": {
      const pm = prepareMachine(m);
      const ratio =
        ((1 + value / 100) * pm.rear.rollingCircumference) / pm.front.rollingCircumference;
      if (m.drive.type === "front-assist") m.drive.gearRatio = ratio;
      else if (m.drive.type === "4wd") m.drive.interAxleRatio = ratio;
      else throw notApplicable(parameter, m);
      return;
    }
    case "hingePosition": {
      if (m.steering.layout !== "articulated") throw notApplicable(parameter, m);
      if (!(value > 0 && value < 1)) throw new Error("hingePosition must lie between 0 and 1.");
      const total = m.steering.frontLength + m.steering.rearLength;
      m.steering.frontLength = value * total;
      m.steering.rearLength = total - m.steering.frontLength;
      return;
    }
    case "rearSteerRatio": {
      const modes = [m.steering, ...m.otherSteeringModes];
      const mode = modes.find((s) => s.layout === "four-wheel");
      if (mode?.layout !== "four-wheel") throw notApplicable(parameter, m);
      mode.rearRatio = value;
      return;
    }
    case "inflationPressure": {
      const axles = axle ? [axle] : (["front", "rear"] as const);
      let changed = false;
      for (const name of axles) {
        const a = m.axles[name];
        if (!a.inflation) continue;
        a.inflation = { pressure: value, ratedLoad: ratedLoadAtPressure(a.inflation, value) };
        changed = true;
      }
      if (!changed) throw noInflation();
      return;
    }
  }
}

/** Apply changes in order. */
export function applyChanges(
  machine: TMachineInput | TMachine,
  dutyCycle: TDutyCycleInput,
  changes: readonly TMachineChange[],
): TVariant {
  let variant: TVariant = { machine: ZMachine.parse(machine), dutyCycle };
  for (const change of changes) variant = applyChange(variant, ZMachineChange.parse(change));
  return variant;
}
