import type { TEstimateResult } from "@/lib/scrub";
import { toCsv, type TCsvCell } from "@/lib/format/csv";

const HEADER = [
  "turn",
  "label",
  "per_hour",
  "feasible",
  "steering_mode",
  "radius_m",
  "steer_input_deg",
  "turning_diameter_m",
  "lateral_acceleration_m_s2",
  "position",
  "steer_angle_deg",
  "slip_angle_deg",
  "path_radius_m",
  "lateral_scrub_m",
  "longitudinal_scrub_m",
  "energy_j",
  "energy_per_hour_j",
];

/** The money column names its currency, as the other columns name their unit. */
const costHeader = (currency: string) => `position_cost_per_hour_${currency}`;

const round = (v: number | null, digits = 4) =>
  v !== null && Number.isFinite(v) ? Number(v.toFixed(digits)) : null;

/**
 * One row per turn kind and wheel position (one row per turn when it has no wheel detail), SI
 * units; the last column is that wheel position's tyre cost per operating hour over the whole
 * duty cycle, in the dealership's currency.
 */
export function estimateTurnsCsv(result: TEstimateResult, currency: string): string {
  const rows: TCsvCell[][] = [];
  const costOf = new Map(result.positions.map((p) => [p.position, p.costPerHour]));
  for (const t of result.turns) {
    const common: TCsvCell[] = [
      t.index + 1,
      t.label,
      round(t.perHour),
      t.feasible,
      t.steeringMode,
      round(t.radius, 3),
      round(t.steerInput, 2),
      round(t.turningDiameter, 3),
      round(t.lateralAcceleration, 3),
    ];
    if (t.wheels.length === 0) {
      rows.push([
        ...common,
        "",
        null,
        null,
        null,
        null,
        null,
        round(t.energy, 1),
        round(t.energy * t.perHour, 1),
        null,
      ]);
      continue;
    }
    for (const w of t.wheels) {
      rows.push([
        ...common,
        w.position,
        round(w.steerAngle, 3),
        round(w.slipAngle, 3),
        round(w.pathRadius, 3),
        round(w.lateralScrub),
        round(w.longitudinalScrub),
        round(w.energy, 1),
        round(w.energy * t.perHour, 1),
        round(costOf.get(w.position) ?? null, 4),
      ]);
    }
  }
  return toCsv([...HEADER, costHeader(currency)], rows);
}

/** A file name safe on every OS, from the estimate title. */
export function csvFileName(title: string): string {
  const slug = title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return `${slug || "estimate"}-turns.csv`;
}
