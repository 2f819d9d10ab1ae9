import type { TMachineInput } from "@/lib/scrub";
import { fromSi, roundForInput, toSi, type TQuantity, type TUnitSystem } from "@/lib/format/units";

/**
 * Which quantity each numeric field of a machine holds, by path with "*" for any key.
 * Angles, ratios and shares have no unit to convert; prices stay in the dealership's currency.
 */
export const MACHINE_FIELD_QUANTITIES: Record<string, TQuantity> = {
  wheelbase: "length-m",
  "axles.*.track": "length-m",
  "axles.*.pivotTrack": "length-m",
  "axles.*.load": "mass-kg",
  "axles.*.ladenLoad": "mass-kg",
  "axles.*.tyre.rollingCircumference": "length-mm",
  "axles.*.tyre.overallDiameter": "length-mm",
  "axles.*.tyre.sectionWidth": "length-mm",
  "axles.*.tyre.treadDepthNew": "length-mm",
  "axles.*.tyre.treadDepthReplace": "length-mm",
  "axles.*.tyre.loadCapacity": "mass-kg",
  "steering.armLength": "length-m",
  "steering.frontLength": "length-m",
  "steering.rearLength": "length-m",
  "steering.contactLength": "length-m",
  "limits.minTurningRadius": "distance-m",
};

/** The quantity of a dotted path such as "axles.front.tyre.treadDepthNew", or "none". */
export function quantityOf(path: string): TQuantity {
  const parts = path.split(".");
  for (const [pattern, quantity] of Object.entries(MACHINE_FIELD_QUANTITIES)) {
    const p = pattern.split(".");
    if (p.length === parts.length && p.every((seg, i) => seg === "*" || seg === parts[i]))
      return quantity;
  }
  return "none";
}

function mapNumbers(
  value: unknown,
  path: string[],
  fn: (path: string, v: number) => number | undefined,
): unknown {
  if (typeof value === "number") return fn(path.join("."), value);
  if (Array.isArray(value)) return value.map((v, i) => mapNumbers(v, [...path, String(i)], fn));
  if (value && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) {
      const mapped = mapNumbers(v, [...path, k], fn);
      if (mapped !== undefined) out[k] = mapped;
    }
    return out;
  }
  return value;
}

/**
 * Converts a machine from display units to SI. Empty number inputs (NaN) become "not given" so
 * optional fields fall back to the engine's defaults and required ones are reported missing.
 */
export function machineToSi(machine: TMachineInput, system: TUnitSystem): TMachineInput {
  return mapNumbers(machine, [], (path, v) =>
    Number.isNaN(v) ? undefined : toSi(system, quantityOf(path), v),
  ) as TMachineInput;
}

/** Converts a stored SI machine to display units for a form. */
export function machineFromSi(machine: TMachineInput, system: TUnitSystem): TMachineInput {
  return mapNumbers(machine, [], (path, v) =>
    roundForInput(fromSi(system, quantityOf(path), v)),
  ) as TMachineInput;
}

/** Converts one steering layout's SI values to display units (used when the layout changes). */
export function steeringFromSi<T extends object>(steering: T, system: TUnitSystem): T {
  return mapNumbers(steering, ["steering"], (path, v) =>
    roundForInput(fromSi(system, quantityOf(path), v)),
  ) as T;
}
