/**
 * Display units. The engine and the API work in SI (m, mm, kg); a user who prefers imperial
 * sees inches, feet and pounds. Factors are exact by definition (NIST SP 811, Appendix B:
 * 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg); inflation pressure shows in psi
 * (NIST SP 811, Appendix B: 1 psi = 6.894 757 kPa, from the exact pound-force and inch).
 */
export type TUnitSystem = "metric" | "imperial";
export type TQuantity =
  "length-m" | "length-mm" | "mass-kg" | "distance-m" | "pressure-kpa" | "none";

const M_PER_IN = 0.0254;
const M_PER_FT = 0.3048;
const KG_PER_LB = 0.45359237;
// 1 lbf = 0.45359237 kg × 9.80665 m/s² (exact); 1 psi = 1 lbf/in².
const KPA_PER_PSI = (KG_PER_LB * 9.80665) / (M_PER_IN * M_PER_IN) / 1000;

type TUnitDef = { label: string; fromSi: (v: number) => number; toSi: (v: number) => number };

const identity = (v: number) => v;

const UNITS: Record<TUnitSystem, Record<TQuantity, TUnitDef>> = {
  metric: {
    "length-m": { label: "m", fromSi: identity, toSi: identity },
    "length-mm": { label: "mm", fromSi: identity, toSi: identity },
    "mass-kg": { label: "kg", fromSi: identity, toSi: identity },
    "distance-m": { label: "m", fromSi: identity, toSi: identity },
    "pressure-kpa": { label: "kPa", fromSi: identity, toSi: identity },
    none: { label: "", fromSi: identity, toSi: identity },
  },
  imperial: {
    // Machine dimensions in inches, as imperial spec sheets give wheelbase and track.
    "length-m": { label: "in", fromSi: (v) => v / M_PER_IN, toSi: (v) => v * M_PER_IN },
    "length-mm": {
      label: "in",
      fromSi: (v) => v / 1000 / M_PER_IN,
      toSi: (v) => v * M_PER_IN * 1000,
    },
    "mass-kg": { label: "lb", fromSi: (v) => v / KG_PER_LB, toSi: (v) => v * KG_PER_LB },
    // Turning circles and paths in feet.
    "distance-m": { label: "ft", fromSi: (v) => v / M_PER_FT, toSi: (v) => v * M_PER_FT },
    "pressure-kpa": { label: "psi", fromSi: (v) => v / KPA_PER_PSI, toSi: (v) => v * KPA_PER_PSI },
    none: { label: "", fromSi: identity, toSi: identity },
  },
};

export function unitLabel(system: TUnitSystem, quantity: TQuantity): string {
  return UNITS[system][quantity].label;
}

export function fromSi(system: TUnitSystem, quantity: TQuantity, value: number): number {
  return UNITS[system][quantity].fromSi(value);
}

export function toSi(system: TUnitSystem, quantity: TQuantity, value: number): number {
  return UNITS[system][quantity].toSi(value);
}

/** Rounds for display so a converted value shows no float noise yet converts back within 1 in 10⁵. */
export function roundForInput(value: number): number {
  return Number.isFinite(value) ? Number(value.toPrecision(6)) : value;
}

/** "12.3 ft" / "3.75 m" with sensible decimals. */
export function formatQuantity(
  system: TUnitSystem,
  quantity: TQuantity,
  si: number,
  digits = 2,
): string {
  if (!Number.isFinite(si)) return "—";
  const v = fromSi(system, quantity, si);
  const label = unitLabel(system, quantity);
  return `${v.toLocaleString("en-GB", { maximumFractionDigits: digits, minimumFractionDigits: 0 })}${label ? ` ${label}` : ""}`;
}

/** Speed from m/s: km/h (× 3.6) or mph (1 mph = 0.44704 m/s exactly, NIST SP 811, Appendix B). */
export function formatSpeed(system: TUnitSystem, metresPerSecond: number, digits = 1): string {
  if (!Number.isFinite(metresPerSecond)) return "—";
  const v = system === "metric" ? metresPerSecond * 3.6 : metresPerSecond / 0.44704;
  return `${v.toLocaleString("en-GB", { maximumFractionDigits: digits })} ${system === "metric" ? "km/h" : "mph"}`;
}
