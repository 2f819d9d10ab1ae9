import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { csvCell, toCsv } from "@/lib/format/csv";
import { csvFileName, estimateTurnsCsv } from "@/features/estimates/lib/estimate-csv";
import { estimate } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";

describe("CSV writing", () => {
  it("quotes per RFC 4180 §2 (fields with comma, quote or line break quoted; quotes doubled)", () => {
    expect(csvCell('say "hi", then go')).toBe('"say ""hi"", then go"');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvCell("plain")).toBe("plain");
  });

  it.each(["=1+1", "+1", "-2+3", "@SUM(A1)", "\tTAB", "\rCR"])(
    "neutralises a text cell starting %j with an apostrophe (OWASP 'CSV Injection')",
    (text) => {
      const parsed = Papa.parse<string[]>(toCsv(["x"], [[text]]), { newline: "\r\n" }).data;
      expect(parsed[1]![0]).toBe(`'${text}`);
    },
  );

  it("writes numbers as numbers, negative ones included, and blanks for missing", () => {
    expect(csvCell(-1.5)).toBe("-1.5");
    expect(csvCell(Number.NaN)).toBe("");
    expect(csvCell(null)).toBe("");
    expect(csvCell(true)).toBe("yes");
  });

  it("round-trips through papaparse, a general-purpose CSV reader", () => {
    const rows = [
      ["a,b", 'q"uote', -3, "=x"],
      ["line\r\nbreak", "", 0, "ok"],
    ];
    const text = toCsv(["one", "two", "three", "four"], rows);
    const parsed = Papa.parse<string[]>(text, { newline: "\r\n", skipEmptyLines: true }).data;
    expect(parsed).toEqual([
      ["one", "two", "three", "four"],
      ["a,b", 'q"uote', "-3", "'=x"],
      ["line\r\nbreak", "", "0", "ok"],
    ]);
  });
});

describe("estimate turns CSV", () => {
  it("has one row per turn and wheel of a demo estimate", () => {
    const m = DEMO_MACHINES[0]!;
    const result = estimate(m.machine, DEMO_DUTY_CYCLES[m.id]!);
    const parsed = Papa.parse<string[]>(estimateTurnsCsv(result, "GBP"), {
      skipEmptyLines: true,
    }).data;
    const wheels = result.turns.reduce((n, t) => n + Math.max(1, t.wheels.length), 0);
    expect(parsed).toHaveLength(1 + wheels);
    expect(parsed[0]).toContain("slip_angle_deg");
  });

  it("names the dealership's currency in the money column and fills it per position", () => {
    const m = DEMO_MACHINES[0]!;
    const result = estimate(m.machine, DEMO_DUTY_CYCLES[m.id]!);
    const [head, ...rows] = Papa.parse<string[]>(estimateTurnsCsv(result, "GBP"), {
      skipEmptyLines: true,
    }).data;
    const col = head!.indexOf("position_cost_per_hour_GBP");
    expect(col).toBeGreaterThan(-1);
    const pos = head!.indexOf("position");
    const withWheel = rows.find((r) => r[pos] !== "")!;
    const expected = result.positions.find((p) => p.position === withWheel[pos])!.costPerHour;
    expect(Number(withWheel[col])).toBeCloseTo(expected, 3);
  });

  it("makes a safe file name", () => {
    expect(csvFileName("Hollin Vale: 140 hp / spring")).toBe("hollin-vale-140-hp-spring-turns.csv");
    expect(csvFileName("***")).toBe("estimate-turns.csv");
  });
});
