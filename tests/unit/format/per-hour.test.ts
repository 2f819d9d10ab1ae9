import { describe, expect, it } from "vitest";
import { formatPerHour } from "@/lib/format/format";

// One rounding rule for counts per hour on the duty-cycle and estimate pages (common practice,
// no source: a fixed number of decimals so equal counts read alike).
describe("formatPerHour", () => {
  it("shows every count per hour with one decimal", () => {
    expect(formatPerHour(9.54)).toBe("9.5");
    expect(formatPerHour(10.96)).toBe("11.0");
    expect(formatPerHour(1234.56)).toBe("1,234.6");
    expect(formatPerHour(null)).toBe("—");
  });
});
