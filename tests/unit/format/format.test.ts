import { describe, expect, it } from "vitest";
import { currencySymbol, formatMoney, isSupportedCurrency } from "@/lib/format/format";

// Expected strings follow the CLDR locale data that ICU (and so Intl.NumberFormat) ships:
// en-GB puts the symbol first with a comma grouping separator; de-DE puts it last with a
// period grouping and a comma decimal; JPY has no minor unit in ISO 4217.
describe("formatMoney", () => {
  it("shows the amount with its currency in the default en-GB locale", () => {
    expect(formatMoney(1234.5, "GBP")).toBe("£1,234.50");
    expect(formatMoney(1.38, "EUR")).toBe("€1.38");
    expect(formatMoney(1.38, "USD")).toBe("US$1.38");
  });

  it("follows the reader's locale", () => {
    expect(formatMoney(1234.5, "EUR", "de-DE")).toBe("1.234,50\u00a0€");
  });

  it("uses the currency's own minor unit (ISO 4217: JPY has none)", () => {
    expect(formatMoney(1234.4, "JPY")).toBe("JP¥1,234");
  });

  it("shows a dash for a missing or non-finite amount", () => {
    expect(formatMoney(null, "GBP")).toBe("—");
    expect(formatMoney(Number.POSITIVE_INFINITY, "GBP")).toBe("—");
  });

  it("gives the symbol for headers", () => {
    expect(currencySymbol("GBP")).toBe("£");
  });
});

describe("isSupportedCurrency", () => {
  it("accepts ISO 4217 codes Intl knows and refuses others", () => {
    expect(isSupportedCurrency("GBP")).toBe(true);
    expect(isSupportedCurrency("EUR")).toBe(true);
    expect(isSupportedCurrency("gbp")).toBe(false);
    expect(isSupportedCurrency("XYZ")).toBe(false);
    expect(isSupportedCurrency("POUNDS")).toBe(false);
  });
});
