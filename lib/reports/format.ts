/** Money with its currency, in the reader's locale (en-GB until users carry a locale). */
export function formatReportMoney(value: number | null, currency: string, digits = 2): string {
  if (value === null || !Number.isFinite(value)) return "—";
  return new Intl.NumberFormat("en-GB", {
    style: "currency",
    currency,
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(value);
}

/**
 * A cost per operating hour ("£0.574/h"): tyre costs per hour are often under one unit of money,
 * so below 10 a third decimal keeps options that differ by fractions of a penny apart.
 */
export function formatReportRate(value: number | null, currency: string): string {
  if (value === null || !Number.isFinite(value)) return "—";
  return `${formatReportMoney(value, currency, Math.abs(value) < 10 ? 3 : 2)}/h`;
}

export function formatHours(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return "—";
  return `${Math.round(value).toLocaleString("en-GB")} h`;
}

export const POSITION_NAMES: Record<string, string> = {
  "front-left": "Front left",
  "front-right": "Front right",
  "rear-left": "Rear left",
  "rear-right": "Rear right",
};

export const LAYOUT_NAMES: Record<string, string> = {
  ideal: "Ideal (Ackermann) steering",
  trapezoid: "Trapezoid linkage steering",
  parallel: "Parallel steering",
  turntable: "Turntable steering",
  articulated: "Articulated frame",
  rear: "Rear-wheel steering",
  "four-wheel": "Four-wheel steering",
  crab: "Crab steering",
  skid: "Skid steering",
};

/** "2.80 m" / "110.2 in" etc. for the reader's unit system. */
export function formatLength(system: "metric" | "imperial", metres: number, digits = 2): string {
  return system === "metric" ? `${metres.toFixed(digits)} m` : `${(metres / 0.0254).toFixed(1)} in`;
}

export function formatDistance(system: "metric" | "imperial", metres: number): string {
  return system === "metric"
    ? `${Math.round(metres).toLocaleString("en-GB")} m`
    : `${Math.round(metres / 0.3048).toLocaleString("en-GB")} ft`;
}

export function formatDepth(system: "metric" | "imperial", mm: number, digits = 2): string {
  return system === "metric" ? `${mm.toFixed(digits)} mm` : `${(mm / 25.4).toFixed(3)} in`;
}

export function formatMass(system: "metric" | "imperial", kg: number): string {
  return system === "metric"
    ? `${Math.round(kg).toLocaleString("en-GB")} kg`
    : `${Math.round(kg / 0.45359237).toLocaleString("en-GB")} lb`;
}

export function formatSpeed(system: "metric" | "imperial", mps: number): string {
  return system === "metric"
    ? `${(mps * 3.6).toFixed(1)} km/h`
    : `${(mps * 2.2369362920544).toFixed(1)} mph`;
}
