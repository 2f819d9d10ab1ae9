/** Display helpers shared by the workspace tables and pages. */
export const DEFAULT_LOCALE = "en-GB";

export const formatDate = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

/**
 * An amount with its currency (ISO 4217 code), in the reader's locale: "£1,234.50", "1.234,50 €".
 * Digits follow the currency's own minor unit (two for GBP and EUR, none for JPY).
 */
export const formatMoney = (
  amount: number | null | undefined,
  currency: string,
  locale: string = DEFAULT_LOCALE,
) =>
  amount === null || amount === undefined || !Number.isFinite(amount)
    ? "—"
    : new Intl.NumberFormat(locale, { style: "currency", currency }).format(amount);

/** The currency's symbol in the locale ("£", "€", "US$"): for column headers and axis labels. */
export const currencySymbol = (currency: string, locale: string = DEFAULT_LOCALE) =>
  new Intl.NumberFormat(locale, { style: "currency", currency })
    .formatToParts(0)
    .find((p) => p.type === "currency")?.value ?? currency;

/** Whether Intl knows the code as a currency (ISO 4217, upper case). */
export function isSupportedCurrency(code: string): boolean {
  if (!/^[A-Z]{3}$/.test(code)) return false;
  return Intl.supportedValuesOf("currency").includes(code);
}

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
