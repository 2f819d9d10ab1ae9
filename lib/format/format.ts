/** Display helpers shared by the workspace tables and pages. */
export const formatDate = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

export const formatMoney = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined || !Number.isFinite(v)
    ? "—"
    : v.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });

export const formatNumber = (v: number | null | undefined, digits = 1) =>
  v === null || v === undefined || !Number.isFinite(v)
    ? "—"
    : v.toLocaleString("en-GB", { maximumFractionDigits: digits });

/**
 * Counts per operating hour, one rule on every page: always one decimal ("9.5", "11.0"), so a
 * duty cycle's 9.54 turns/h and an estimate's 10.96 do not read as 9.54 and 11.
 */
export const formatPerHour = (v: number | null | undefined) =>
  v === null || v === undefined || !Number.isFinite(v)
    ? "—"
    : v.toLocaleString("en-GB", { minimumFractionDigits: 1, maximumFractionDigits: 1 });

export const POSITION_LABELS: Record<string, string> = {
  "front-left": "Front left",
  "front-right": "Front right",
  "rear-left": "Rear left",
  "rear-right": "Rear right",
};
