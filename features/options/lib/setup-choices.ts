/**
 * The changes a dealer may try on one machine, built from its layout: only what the engine can
 * apply to that steering and drive (no arm angle on a skid steer, no lead without a driven front
 * axle). Each choice lists its form fields in the user's units, starting at today's setting, and
 * turns the entered text back into an engine change in SI. Pure: runs in the browser and tests.
 */
import {
  parameterValue,
  SWEEP_PARAMETERS,
  type TMachine,
  type TMachineChange,
  type TSweepParameter,
} from "@/lib/scrub";
import { fromSi, roundForInput, toSi, unitLabel, type TQuantity } from "@/lib/format/units";
import type { TUnitSystem } from "@/lib/format/units";

export type TChoiceField = {
  name: string;
  label: string;
  /** Unit label in the user's system ("" for text, yes/no and pure numbers). */
  unit: string;
  type: "number" | "text" | "select";
  options?: { value: string; label: string }[];
  /** Today's value in display units, as the input shows it. */
  initial: string;
  optional?: boolean;
  hint?: string;
};

export type TSetupChoice = { key: string; label: string; hint: string; fields: TChoiceField[] };

type TAxleName = "front" | "rear";

/** Plain names of the engine's sweep parameters, for labels, charts and menus. */
export const PARAMETER_LABELS: Record<TSweepParameter, string> = {
  armAngle: "Steering arm angle",
  frontTrack: "Front track",
  rearTrack: "Rear track",
  lead: "Front-axle lead",
  hingePosition: "Hinge position",
  rearSteerRatio: "Rear-steer ratio",
  inflationPressure: "Inflation pressure",
};

/** What each parameter's number is, for converting between SI and the user's units. */
export const PARAMETER_QUANTITIES: Record<TSweepParameter, TQuantity> = {
  armAngle: "none",
  frontTrack: "length-m",
  rearTrack: "length-m",
  lead: "none",
  hingePosition: "none",
  rearSteerRatio: "none",
  inflationPressure: "pressure-kpa",
};

const PARAMETER_UNITS: Record<TSweepParameter, string> = {
  armAngle: "°",
  frontTrack: "",
  rearTrack: "",
  lead: "%",
  hingePosition: "share ahead of the hinge",
  rearSteerRatio: "rear/front",
  inflationPressure: "",
};

/** Unit label of a parameter in the user's system. */
export function parameterUnit(system: TUnitSystem, parameter: TSweepParameter): string {
  const q = PARAMETER_QUANTITIES[parameter];
  return q === "none" ? PARAMETER_UNITS[parameter] : unitLabel(system, q);
}

/** A parameter value from SI to display units and back. */
export const parameterFromSi = (system: TUnitSystem, p: TSweepParameter, v: number) =>
  fromSi(system, PARAMETER_QUANTITIES[p], v);
export const parameterToSi = (system: TUnitSystem, p: TSweepParameter, v: number) =>
  toSi(system, PARAMETER_QUANTITIES[p], v);

/** Parameters that apply to this machine, with today's value (SI); inflation needs a pressure. */
export function applicableParameters(
  machine: TMachine,
): { parameter: TSweepParameter; current: number }[] {
  const out: { parameter: TSweepParameter; current: number }[] = [];
  for (const parameter of SWEEP_PARAMETERS) {
    try {
      out.push({ parameter, current: parameterValue(machine, parameter) });
    } catch {
      // Not on this layout or drive.
    }
  }
  return out;
}

const show = (system: TUnitSystem, q: TQuantity, v: number | undefined) =>
  v === undefined ? "" : String(roundForInput(fromSi(system, q, v)));

const AXLE_WORD: Record<TAxleName, string> = { front: "Front", rear: "Rear" };

function numberField(
  system: TUnitSystem,
  name: string,
  label: string,
  q: TQuantity,
  value: number | undefined,
  extra: Partial<TChoiceField> = {},
): TChoiceField {
  return {
    name,
    label,
    unit: q === "none" ? "" : unitLabel(system, q),
    type: "number",
    initial: show(system, q, value),
    ...extra,
  };
}

/** Every change that fits this machine's layout, in the order a dealer usually weighs them. */
export function setupChoices(machine: TMachine, system: TUnitSystem): TSetupChoice[] {
  const choices: TSetupChoice[] = [];
  for (const { parameter, current } of applicableParameters(machine)) {
    if (parameter === "inflationPressure") continue; // offered per axle below
    choices.push({
      key: `parameter:${parameter}`,
      label: PARAMETER_LABELS[parameter],
      hint: PARAMETER_HINTS[parameter],
      fields: [
        {
          name: "value",
          label: PARAMETER_LABELS[parameter],
          unit: parameterUnit(system, parameter),
          type: "number",
          initial: String(roundForInput(parameterFromSi(system, parameter, current))),
        },
      ],
    });
  }
  const steering = steeringChoice(machine, system);
  if (steering) choices.push(steering);
  for (const axle of ["front", "rear"] as const) {
    const a = machine.axles[axle];
    choices.push({
      key: `inflation:${axle}`,
      label: `${AXLE_WORD[axle]} inflation pressure`,
      hint: "Pressure and the tyre maker's rated load per tyre at that pressure and the working speed.",
      fields: [
        numberField(system, "pressure", "Pressure", "pressure-kpa", a.inflation?.pressure),
        numberField(system, "ratedLoad", "Rated load per tyre", "mass-kg", a.inflation?.ratedLoad),
      ],
    });
  }
  for (const axle of ["front", "rear"] as const) {
    const t = machine.axles[axle].tyre;
    choices.push({
      key: `tyres:${axle}`,
      label: `${AXLE_WORD[axle]} tyres`,
      hint: "Another size or make of tyre on both wheels of the axle, from the maker's data book.",
      fields: [
        { name: "designation", label: "Size", unit: "", type: "text", initial: t.designation },
        { ...numberField(system, "price", "Price per tyre", "none", t.price) },
        numberField(system, "treadDepthNew", "Tread depth new", "length-mm", t.treadDepthNew),
        numberField(
          system,
          "treadDepthReplace",
          "Replace at tread depth",
          "length-mm",
          t.treadDepthReplace,
        ),
        numberField(
          system,
          "rollingCircumference",
          "Rolling circumference",
          "length-mm",
          t.rollingCircumference,
          { optional: true, hint: "From the data book; estimated from the size when empty." },
        ),
        numberField(system, "loadCapacity", "Load capacity per tyre", "mass-kg", t.loadCapacity, {
          optional: true,
        }),
      ],
    });
  }
  choices.push({
    key: "ballast",
    label: "Ballast",
    hint: "Ballast carried on each axle, replacing what the machine carries now.",
    fields: [
      numberField(system, "front", "Front ballast", "mass-kg", machine.ballast?.front ?? 0),
      numberField(system, "rear", "Rear ballast", "mass-kg", machine.ballast?.rear ?? 0),
    ],
  });
  if (machine.drive.type === "front-assist") {
    choices.push({
      key: "front-assist-in-turns",
      label: "Front-wheel assist in turns",
      hint: "Whether the operator leaves the assist engaged through headland turns.",
      fields: [
        {
          name: "engaged",
          label: "Assist in turns",
          unit: "",
          type: "select",
          options: [
            { value: "false", label: "Disengaged" },
            { value: "true", label: "Engaged" },
          ],
          initial: "false",
        },
      ],
    });
  }
  return choices;
}

const PARAMETER_HINTS: Record<TSweepParameter, string> = {
  armAngle:
    "Inclination of the steering arms at straight ahead; sets how close the linkage comes to Ackermann.",
  frontTrack: "Distance between the front tyre centres (wheel offset or rim setting).",
  rearTrack: "Distance between the rear tyre centres (wheel offset or rim setting).",
  lead: "How much faster the front tyres roll than the rear with the drive engaged.",
  hingePosition: "Share of the wheelbase ahead of the frame hinge.",
  rearSteerRatio: "Rear steer relative to front steer in four-wheel steering.",
  inflationPressure: "Working pressure; the rated load follows the load–pressure relation.",
};

function steeringChoice(machine: TMachine, system: TUnitSystem): TSetupChoice | null {
  const s = machine.steering;
  const lock = (v: number, label = "Largest steer angle") =>
    numberField(system, "maxLock", label, "none", v, { unit: "°" });
  let fields: TChoiceField[];
  switch (s.layout) {
    case "skid":
      return null;
    case "trapezoid":
      fields = [
        lock(s.maxLock),
        numberField(system, "armLength", "Steering arm length", "length-m", s.armLength),
        {
          name: "tieRod",
          label: "Tie rod",
          unit: "",
          type: "select",
          options: [
            { value: "behind", label: "Behind the axle" },
            { value: "ahead", label: "Ahead of the axle" },
          ],
          initial: s.tieRod,
        },
      ];
      break;
    case "articulated":
      fields = [
        numberField(system, "maxArticulation", "Largest articulation", "none", s.maxArticulation, {
          unit: "°",
        }),
      ];
      break;
    default:
      fields = [lock(s.maxLock)];
  }
  return {
    key: "steering",
    label: "Steering lock and linkage",
    hint: "Stops, arm length or tie-rod position of today's steering layout.",
    fields,
  };
}

/** Result of reading a change's fields: the engine change, or what to fix per field. */
export type TChangeRead =
  { ok: true; change: TMachineChange } | { ok: false; errors: Record<string, string> };

/** Turns one chosen change's entered values (display units) into an engine change (SI). */
export function readChange(
  machine: TMachine,
  system: TUnitSystem,
  key: string,
  values: Record<string, string | undefined>,
): TChangeRead {
  const choice = setupChoices(machine, system).find((c) => c.key === key);
  if (!choice) return { ok: false, errors: { key: "Choose a change that fits this machine." } };
  const errors: Record<string, string> = {};
  const num = (name: string, q: TQuantity, min = 0, strict = true): number | undefined => {
    const field = choice.fields.find((f) => f.name === name);
    const raw = (values[name] ?? "").trim();
    if (raw === "") {
      if (!field?.optional) errors[name] = `Enter ${field?.label.toLowerCase() ?? name}.`;
      return undefined;
    }
    const v = Number(raw.replace(",", "."));
    if (!Number.isFinite(v) || (strict ? v <= min : v < min)) {
      errors[name] =
        `${field?.label ?? name} must be a number ${strict ? "above" : "of at least"} ${min}.`;
      return undefined;
    }
    return toSi(system, q, v);
  };
  const [kind, target] = key.split(":") as [string, string | undefined];
  let change: TMachineChange | undefined;
  switch (kind) {
    case "parameter": {
      const parameter = target as TSweepParameter;
      const raw = (values.value ?? "").trim();
      const v = Number(raw.replace(",", "."));
      if (raw === "" || !Number.isFinite(v)) errors.value = `Enter a number for the new setting.`;
      else change = { kind: "parameter", parameter, value: parameterToSi(system, parameter, v) };
      break;
    }
    case "inflation": {
      const pressure = num("pressure", "pressure-kpa");
      const ratedLoad = num("ratedLoad", "mass-kg");
      if (pressure !== undefined && ratedLoad !== undefined)
        change = { kind: "inflation", axle: target as TAxleName, pressure, ratedLoad };
      break;
    }
    case "tyres": {
      const designation = (values.designation ?? "").trim();
      if (!designation) errors.designation = "Enter the tyre size as moulded on the sidewall.";
      const price = num("price", "none", 0, false);
      const treadDepthNew = num("treadDepthNew", "length-mm");
      const treadDepthReplace = num("treadDepthReplace", "length-mm", 0, false);
      const rollingCircumference = num("rollingCircumference", "length-mm");
      const loadCapacity = num("loadCapacity", "mass-kg");
      if (
        treadDepthNew !== undefined &&
        treadDepthReplace !== undefined &&
        treadDepthReplace >= treadDepthNew
      )
        errors.treadDepthReplace = "The replacement depth must be less than the new tread depth.";
      if (
        designation &&
        price !== undefined &&
        treadDepthNew !== undefined &&
        treadDepthReplace !== undefined &&
        Object.keys(errors).length === 0
      ) {
        const axle = target as TAxleName;
        const old = machine.axles[axle].tyre;
        change = {
          kind: "tyres",
          axle,
          tyre: {
            designation,
            price,
            treadDepthNew,
            treadDepthReplace,
            ...(rollingCircumference !== undefined ? { rollingCircumference } : {}),
            ...(loadCapacity !== undefined ? { loadCapacity } : {}),
            ...(old.corneringStiffnessCoefficient !== undefined
              ? { corneringStiffnessCoefficient: old.corneringStiffnessCoefficient }
              : {}),
          },
        };
      }
      break;
    }
    case "ballast": {
      const front = num("front", "mass-kg", 0, false);
      const rear = num("rear", "mass-kg", 0, false);
      if (front !== undefined && rear !== undefined) change = { kind: "ballast", front, rear };
      break;
    }
    case "front-assist-in-turns":
      change = { kind: "front-assist-in-turns", engaged: values.engaged === "true" };
      break;
    case "steering": {
      const s = structuredClone(machine.steering);
      if (s.layout === "trapezoid") {
        const maxLock = num("maxLock", "none");
        const armLength = num("armLength", "length-m");
        if (maxLock !== undefined) s.maxLock = maxLock;
        if (armLength !== undefined) s.armLength = armLength;
        s.tieRod = values.tieRod === "ahead" ? "ahead" : "behind";
      } else if (s.layout === "articulated") {
        const a = num("maxArticulation", "none");
        if (a !== undefined) s.maxArticulation = a;
      } else if (s.layout !== "skid") {
        const maxLock = num("maxLock", "none");
        if (maxLock !== undefined) s.maxLock = maxLock;
      }
      if (Object.keys(errors).length === 0) change = { kind: "steering", steering: s };
      break;
    }
  }
  if (Object.keys(errors).length > 0 || !change) return { ok: false, errors };
  return { ok: true, change };
}

/** One change in plain words with its new value in the user's units ("Front track 1.9 m"). */
export function describeChange(change: TMachineChange, system: TUnitSystem): string {
  const q = (quantity: TQuantity, v: number, digits = 2) => {
    const d = fromSi(system, quantity, v).toLocaleString("en-GB", {
      maximumFractionDigits: digits,
    });
    const u = quantity === "none" ? "" : ` ${unitLabel(system, quantity)}`;
    return `${d}${u}`;
  };
  switch (change.kind) {
    case "parameter": {
      const unit = parameterUnit(system, change.parameter);
      const v = parameterFromSi(system, change.parameter, change.value);
      const axle = change.axle ? ` (${change.axle} axle)` : "";
      const sep = unit === "°" || unit === "" ? "" : " ";
      return `${PARAMETER_LABELS[change.parameter]}${axle} ${v.toLocaleString("en-GB", { maximumFractionDigits: 3 })}${sep}${unit}`;
    }
    case "inflation":
      return `${AXLE_WORD[change.axle]} pressure ${q("pressure-kpa", change.pressure, 0)}, rated load ${q("mass-kg", change.ratedLoad, 0)} per tyre`;
    case "tyres":
      return `${AXLE_WORD[change.axle]} tyres ${change.tyre.designation}`;
    case "ballast":
      return `Ballast ${q("mass-kg", change.front, 0)} front, ${q("mass-kg", change.rear, 0)} rear`;
    case "front-assist-in-turns":
      return `Front-wheel assist ${change.engaged ? "engaged" : "disengaged"} in turns`;
    case "steering": {
      const s = change.steering;
      if (s.layout === "trapezoid")
        return `Steering lock ${s.maxLock}°, arm ${q("length-m", s.armLength, 3)}, tie rod ${s.tieRod} the axle`;
      if (s.layout === "articulated") return `Articulation up to ${s.maxArticulation}°`;
      if (s.layout === "skid") return "Skid steering";
      return `Steering lock ${s.maxLock}°`;
    }
  }
}
