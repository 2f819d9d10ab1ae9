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

export const POSITION_LABELS: Record<string, string> = {
  "front-left": "Front left",
  "front-right": "Front right",
  "rear-left": "Rear left",
  "rear-right": "Rear right",
};
