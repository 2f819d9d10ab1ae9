/** Unit conversions into the SI units used inside (m, m/s, s, deg, deg/s). */
import type { TUnit } from "@/lib/duty-cycles/column-mapping";

const MPH = 0.44704; // exact, by definition of the international mile
const FOOT = 0.3048; // exact, international foot

const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * Plain decimals ("-12.345") read digit by digit. Exact: with at most 15 significant digits the
 * integer mantissa and the power of ten are both exact doubles, so one division is correctly
 * rounded (Clinger, "How to read floating point numbers accurately", PLDI 1990, fast path).
 * Anything else (exponents, spaces, more digits) returns NaN for the general path: a NaN, not
 * undefined, keeps the result a plain double (no boxed number per cell on this hot path).
 */
function readPlainDecimal(text: string, mark: number): number {
  const n = text.length;
  if (n === 0 || n > 17) return NaN;
  let i = 0;
  let negative = false;
  const first = text.charCodeAt(0);
  if (first === 45 /* - */ || first === 43 /* + */) {
    negative = first === 45;
    i = 1;
  }
  const start = i;
  // Digits gather in a small integer, flushed into the double every 8 digits: integer
  // multiply-adds are cheaper than a chain of floating-point ones (this runs for every cell).
  let mantissa = 0;
  let pending = 0;
  let pendingDigits = 0;
  let dot = -1;
  for (; i < n; i++) {
    const d = text.charCodeAt(i) - 48;
    if (d >= 0 && d <= 9) {
      pending = pending * 10 + d;
      if (++pendingDigits === 8) {
        mantissa = mantissa * 1e8 + pending;
        pending = pendingDigits = 0;
      }
    } else if (d === mark - 48 && dot < 0) dot = i;
    else return NaN;
  }
  mantissa = mantissa * POW10[pendingDigits]! + pending;
  const digits = n - start - (dot < 0 ? 0 : 1);
  if (digits === 0 || digits > 15) return NaN;
  const scale = dot < 0 ? 0 : n - 1 - dot;
  const value = scale > 0 ? mantissa / POW10[scale]! : mantissa;
  return negative ? -value : value;
}

/** Parses a decimal number written with "." or "," as the decimal mark; NaN when it is not one. */
export function parseDecimal(text: string, decimal: "." | ","): number {
  const fast = readPlainDecimal(text, decimal === "," ? 44 : 46);
  if (fast === fast) return fast; // not NaN

  // Hot path (millions of cells): Number() already ignores surrounding spaces; only a blank
  // cell, which Number() reads as 0, needs a second look.
  const n = Number(decimal === "," && text.includes(",") ? text.replace(",", ".") : text);
  if (n === 0 && text.trim() === "") return NaN;
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

/** Every unit here converts to SI by a constant factor: precompute it once per column. */
export function siFactor(unit: TUnit): number {
  return toSi(1, unit);
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
