/**
 * What each column of an uploaded CSV means, and in which unit. The browser proposes a mapping
 * from the preview; the dealer corrects it; the import applies it row by row.
 */
import type { TSurfaceKind } from "@/lib/scrub/schemas";

export const FILE_KINDS = ["telematics", "schedule"] as const;
export type TFileKind = (typeof FILE_KINDS)[number];

export const TELEMATICS_ROLES = [
  "time",
  "speed",
  "yawRate",
  "heading",
  "steer",
  "lat",
  "lon",
  "surface",
  "load",
  "direction",
  "hourMeter",
] as const;
export const SCHEDULE_ROLES = [
  "radius",
  "steerInput",
  "headingChange",
  "speed",
  "count",
  "surface",
  "load",
  "direction",
  "label",
] as const;
export type TTelematicsRole = (typeof TELEMATICS_ROLES)[number];
export type TScheduleRole = (typeof SCHEDULE_ROLES)[number];
export type TColumnRole = TTelematicsRole | TScheduleRole;

/** Units a column may be in; each role accepts the units listed in ROLE_UNITS. */
export const UNITS = [
  "s",
  "ms",
  "iso8601",
  "km/h",
  "mph",
  "m/s",
  "deg/s",
  "rad/s",
  "deg",
  "rad",
  "m",
  "ft",
  "h",
  "per-hour",
  "per-shift",
  "text",
] as const;
export type TUnit = (typeof UNITS)[number];

export const ROLE_UNITS: Record<TColumnRole, readonly TUnit[]> = {
  time: ["s", "ms", "iso8601"],
  speed: ["km/h", "mph", "m/s"],
  yawRate: ["deg/s", "rad/s"],
  heading: ["deg", "rad"],
  steer: ["deg", "rad"],
  lat: ["deg"],
  lon: ["deg"],
  surface: ["text"],
  load: ["text"],
  direction: ["text"],
  hourMeter: ["h"],
  radius: ["m", "ft"],
  steerInput: ["deg", "rad"],
  headingChange: ["deg", "rad"],
  count: ["per-hour", "per-shift"],
  label: ["text"],
};

export const ROLE_LABELS: Record<TColumnRole, string> = {
  time: "Time",
  speed: "Ground speed",
  yawRate: "Yaw rate",
  heading: "Compass heading",
  steer: "Road-wheel steer angle",
  lat: "Latitude",
  lon: "Longitude",
  surface: "Surface",
  load: "Load state",
  direction: "Gear / travel direction",
  hourMeter: "Hour meter",
  radius: "Turn radius",
  steerInput: "Steer angle",
  headingChange: "Heading change",
  count: "Count",
  label: "Label",
};

export const UNIT_LABELS: Record<TUnit, string> = {
  s: "seconds (elapsed or epoch)",
  ms: "milliseconds (elapsed or epoch)",
  iso8601: "date-time (ISO 8601)",
  "km/h": "km/h",
  mph: "mph",
  "m/s": "m/s",
  "deg/s": "degrees per second",
  "rad/s": "radians per second",
  deg: "degrees",
  rad: "radians",
  m: "metres",
  ft: "feet",
  h: "hours",
  "per-hour": "per operating hour",
  "per-shift": "per shift",
  text: "text",
};

export type TColumnRef = { index: number; header?: string; unit: TUnit };

export type TColumnMapping = {
  kind: TFileKind;
  /** Field separator, resolved from the preview (papaparse's detection or the dealer's choice). */
  delimiter: string;
  decimal: "." | ",";
  hasHeader: boolean;
  encoding: "utf-8" | "latin1";
  columns: Partial<Record<TColumnRole, TColumnRef>>;
  defaults: {
    /** Surface of rows with no surface column or an empty cell. */
    surface: TSurfaceKind;
    loadState: "laden" | "unladen";
    /** Hours in a shift, for schedules that count turns per shift. */
    shiftHours: number;
    /** Needed to read a steer angle column as a yaw rate (m). */
    wheelbase?: number;
    /** Fastest the machine can go (m/s): faster rows are rejected as impossible. */
    maxSpeed: number;
    /** Schedules only: straight travel per operating hour (m) and its speed (m/s). */
    straightDistancePerHour?: number;
    straightSpeed?: number;
  };
};

export const HEADING_SOURCES = ["yawRate", "steer", "heading", "lat"] as const;

/**
 * Problems that make a mapping unusable before any row is read, as messages that say what to
 * fix. Empty when the mapping is complete.
 */
export function mappingProblems(m: TColumnMapping): string[] {
  const problems: string[] = [];
  const has = (r: TColumnRole) => m.columns[r] !== undefined;
  if (m.kind === "telematics") {
    if (!has("time")) problems.push("Choose the column that holds the time of each sample.");
    if (!has("speed")) problems.push("Choose the column that holds the ground speed.");
    if (!HEADING_SOURCES.some(has))
      problems.push(
        "Choose at least one heading source: yaw rate, steer angle, compass heading, or latitude and longitude.",
      );
    if (has("lat") !== has("lon"))
      problems.push("GPS positions need both a latitude and a longitude column.");
    if (has("steer") && !has("yawRate") && !has("heading") && !has("lat") && !m.defaults.wheelbase)
      problems.push("A steer angle column needs the machine's wheelbase to give a yaw rate.");
  } else {
    if (!has("radius") && !has("steerInput"))
      problems.push("Choose a turn radius or a steer angle column.");
    if (!has("headingChange")) problems.push("Choose the heading change column.");
    if (!has("speed")) problems.push("Choose the speed column.");
    if (!has("count")) problems.push("Choose the column that counts turns per hour or per shift.");
  }
  for (const [role, ref] of Object.entries(m.columns) as [TColumnRole, TColumnRef][]) {
    if (!ROLE_UNITS[role].includes(ref.unit))
      problems.push(`${ROLE_LABELS[role]}: the unit "${ref.unit}" does not apply.`);
  }
  const used = new Map<number, TColumnRole>();
  for (const [role, ref] of Object.entries(m.columns) as [TColumnRole, TColumnRef][]) {
    const other = used.get(ref.index);
    if (other)
      problems.push(
        `Column ${ref.index + 1} is mapped twice (${ROLE_LABELS[other]} and ${ROLE_LABELS[role]}).`,
      );
    used.set(ref.index, role);
  }
  return problems;
}
