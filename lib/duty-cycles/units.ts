/** Unit conversions into the SI units used inside (m, m/s, s, deg, deg/s). */
import type { TUnit } from "@/lib/duty-cycles/column-mapping";

const MPH = 0.44704; // exact, by definition of the international mile
const FOOT = 0.3048; // exact, international foot

/** Parses a decimal number written with "." or "," as the decimal mark; NaN when it is not one. */
export function parseDecimal(text: string, decimal: "." | ","): number {
  const trimmed = text.trim();
  if (trimmed === "") return NaN;
  const n = Number(decimal === "," ? trimmed.replace(",", ".") : trimmed);
  return n;
}

/** Converts a parsed number in `unit` to SI (m/s, m, deg, deg/s, s, h). */
export function toSi(value: number, unit: TUnit): number {
  switch (unit) {
    case "km/h":
      return value / 3.6;
    case "mph":
      return value * MPH;
    case "ft":
      return value * FOOT;
    case "rad":
    case "rad/s":
      return (value * 180) / Math.PI;
    case "ms":
      return value / 1000;
    default:
      return value;
  }
}

/** Reads a time cell as seconds (elapsed or since the epoch); NaN when unreadable. */
export function parseTime(text: string, unit: TUnit, decimal: "." | ","): number {
  if (unit === "iso8601") {
    const trimmed = text.trim();
    // Only date-times: Date.parse also accepts loose formats that would hide mistakes.
    if (!/^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}/.test(trimmed)) return NaN;
    const ms = Date.parse(trimmed.replace(" ", "T"));
    return Number.isFinite(ms) ? ms / 1000 : NaN;
  }
  return toSi(parseDecimal(text, decimal), unit);
}

/** Shows a speed (m/s) in km/h for messages. */
export function formatKmh(mps: number): string {
  return `${(mps * 3.6).toFixed(1)} km/h`;
}
