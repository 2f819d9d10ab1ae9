import type { TTyrePosition } from "@/lib/calibration";

export type TUnitSystem = "metric" | "imperial";

/** Money always with its currency (ISO 4217 code shown by Intl as symbol or code). */
export const formatMoney = (value: number | null | undefined, currency: string, digits = 2) =>
  value === null || value === undefined || !Number.isFinite(value)
    ? "—"
    : new Intl.NumberFormat("en-GB", {
        style: "currency",
        currency,
        minimumFractionDigits: digits,
        maximumFractionDigits: digits,
      }).format(value);

/** Tread depths: mm, or inches (1 in = 25.4 mm exactly, NIST SP 811 App. B) for imperial users. */
export const MM_PER_IN = 25.4;
export const depthUnit = (system: TUnitSystem) => (system === "imperial" ? "in" : "mm");
export const depthFromMm = (system: TUnitSystem, mm: number) =>
  system === "imperial" ? mm / MM_PER_IN : mm;
export const depthToMm = (system: TUnitSystem, v: number) =>
  system === "imperial" ? v * MM_PER_IN : v;
export const formatDepth = (system: TUnitSystem, mm: number | null | undefined) =>
  mm === null || mm === undefined || !Number.isFinite(mm)
    ? "—"
    : `${depthFromMm(system, mm).toLocaleString("en-GB", { maximumFractionDigits: system === "imperial" ? 2 : 1 })} ${depthUnit(system)}`;
export const formatRate = (system: TUnitSystem, mmPer100h: number) =>
  `${formatDepth(system, mmPer100h)} per 100 h`;
export const formatHours = (h: number | null | undefined) =>
  h === null || h === undefined || !Number.isFinite(h)
    ? "—"
    : `${Math.round(h).toLocaleString("en-GB")} h`;
export const formatDay = (iso: string | null) =>
  iso
    ? new Date(`${iso}T00:00:00Z`).toLocaleDateString("en-GB", {
        day: "numeric",
        month: "short",
        year: "numeric",
        timeZone: "UTC",
      })
    : "—";

export const POSITION_NAMES: Record<TTyrePosition, string> = {
  "front-left": "Front left",
  "front-right": "Front right",
  "rear-left": "Rear left",
  "rear-right": "Rear right",
};
