/** Money from minor units with its currency always shown, e.g. "£39.00". */
export function formatMoney(minor: number, currency: string, locale = "en-GB"): string {
  return new Intl.NumberFormat(locale, {
    style: "currency",
    currency: currency.toUpperCase(),
    currencyDisplay: "symbol",
  }).format(minor / 100);
}
