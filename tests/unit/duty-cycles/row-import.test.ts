import { describe, expect, it } from "vitest";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { createScheduleImporter } from "@/lib/duty-cycles/schedule-import";
import { ImportFailure } from "@/lib/duty-cycles/row-errors";
import { parseTime, toSi, parseDecimal } from "@/lib/duty-cycles/units";
import { mappingProblems, type TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { csvField, neutraliseFormula } from "@/lib/duty-cycles/csv-export";
import { sniffContent } from "@/lib/duty-cycles/sniff-content";
import { toEngineDutyCycle } from "@/lib/duty-cycles/to-engine-duty-cycle";
import { samplePath } from "@/lib/duty-cycles/synthetic-path";

const defaults = {
  surface: "firm-soil",
  loadState: "unladen",
  shiftHours: 8,
  maxSpeed: 25,
} as const;

describe("units", () => {
  // Exact conversion factors: 1 mph = 0.44704 m/s and 1 ft = 0.3048 m (international yard and
  // pound agreement, 1959); 1 km/h = 1/3.6 m/s; π rad = 180°.
  it.each([
    [36, "km/h", 10],
    [10, "mph", 4.4704],
    [100, "ft", 30.48],
    [Math.PI, "rad", 180],
    [Math.PI / 2, "rad/s", 90],
    [1500, "ms", 1.5],
  ] as const)("%d %s", (value, unit, si) => expect(toSi(value, unit)).toBeCloseTo(si, 9));

  it("reads decimal commas and ISO 8601 times (RFC 3339 profile)", () => {
    expect(parseDecimal(" 12,5 ", ",")).toBe(12.5);
    expect(parseDecimal("", ".")).toBeNaN();
    expect(
      parseTime("2026-05-01T06:00:01.5Z", "iso8601", ".") -
        parseTime("2026-05-01T06:00:00Z", "iso8601", "."),
    ).toBeCloseTo(1.5, 9);
    expect(parseTime("2026-05-01 06:00:00Z", "iso8601", ".")).toBe(Date.UTC(2026, 4, 1, 6) / 1000);
    expect(parseTime("yesterday", "iso8601", ".")).toBeNaN();
  });
});

describe("telematics rows", () => {
  const mapping: TColumnMapping = {
    kind: "telematics",
    delimiter: ";",
    decimal: ",",
    hasHeader: true,
    encoding: "latin1",
    columns: {
      time: { index: 0, header: "Zeit", unit: "iso8601" },
      speed: { index: 1, header: "Geschw", unit: "mph" },
      heading: { index: 2, header: "Kurs", unit: "deg" },
      direction: { index: 3, header: "Gang", unit: "text" },
    },
    defaults,
  };

  it("converts, validates and reports each bad row with line, column and reason", () => {
    const imp = createTelematicsImporter(mapping);
    const start = Date.UTC(2026, 4, 1, 6) / 1000;
    const iso = (s: number) => new Date((start + s) * 1000).toISOString();
    let line = 2;
    for (let i = 0; i < 1200; i++) imp.pushRow([iso(i * 0.5), "5,0", "90", "F"], line++);
    imp.pushRow([iso(100), "5,0", "90", "F"], line++); // goes back in time
    imp.pushRow([iso(601), "95", "90", "F"], line++); // 95 mph
    imp.pushRow([iso(602), "5,0", "90", "sideways"], line++);
    imp.pushRow([iso(603), "5,0"], line++);
    const r = imp.finish();
    expect(r.rowsUsed).toBe(1200);
    expect(r.rowsSkipped).toBe(4);
    expect(r.errors.map((e) => [e.line, e.column])).toEqual([
      [1202, "Zeit"],
      [1203, "Geschw"],
      [1204, "Gang"],
      [1205, "(row)"],
    ]);
    expect(r.errors[0]!.reason).toMatch(/goes back in time/);
    expect(r.errors[1]!.reason).toMatch(
      /152\.9 km\/h is beyond what the machine can reach \(limit 90\.0 km\/h\)/,
    );
    // 599.5 s of logging at 5 mph = 2.2352 m/s.
    expect(r.operatingHours).toBeCloseTo(599.5 / 3600, 9);
    expect(r.straight.distancePerHour).toBeCloseTo(2.2352 * 3600, 3);
  });

  it("fails with a clear message when most rows are bad, and when none are usable", () => {
    const imp = createTelematicsImporter(mapping);
    imp.pushRow(["2026-05-01T06:00:00Z", "1", "0", "F"], 2);
    imp.pushRow(["x", "1", "0", "F"], 3);
    imp.pushRow(["y", "1", "0", "F"], 4);
    expect(() => imp.finish()).toThrow(/2 of 3 rows were rejected/);
    const none = createTelematicsImporter(mapping);
    try {
      none.pushRow(["x", "1", "0", "F"], 2);
      none.finish();
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ImportFailure);
      expect((e as ImportFailure).message).toMatch(/no usable rows/);
      expect((e as ImportFailure).errors).toHaveLength(1);
    }
  });

  it("counts operating hours from the hour meter when one is mapped, turns per hour from them", () => {
    const imp = createTelematicsImporter({
      ...mapping,
      decimal: ".",
      columns: {
        time: { index: 0, unit: "s" },
        speed: { index: 1, unit: "m/s" },
        yawRate: { index: 2, unit: "deg/s" },
        hourMeter: { index: 3, unit: "h" },
      },
    });
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 60, speed: 3 },
        { kind: "arc", radius: 6, headingChange: 180, speed: 2 },
        { kind: "straight", distance: 60, speed: 3 },
      ],
    });
    path.forEach((s, i) =>
      imp.pushRow(
        [String(s.t), String(s.speed), String(s.yawRate), String(1000 + s.t / 1800)],
        i + 2,
      ),
    );
    const r = imp.finish();
    // The hour meter ran twice as fast as the clock: twice the operating hours, half the rate.
    expect(r.operatingHours).toBeCloseTo((2 * path.at(-1)!.t) / 3600, 6);
    expect(r.turns).toHaveLength(1);
    expect(r.turns[0]!.perHour).toBeCloseTo(1 / r.operatingHours!, 9);
    const engine = toEngineDutyCycle({ name: "log", turns: r.turns, straight: r.straight });
    expect(engine.turns[0]!.turn.radius).toBeCloseTo(6, 0);
  });
});

describe("turn schedules", () => {
  const mapping: TColumnMapping = {
    kind: "schedule",
    delimiter: ",",
    decimal: ".",
    hasHeader: true,
    encoding: "utf-8",
    columns: {
      radius: { index: 0, unit: "ft" },
      headingChange: { index: 1, unit: "deg" },
      speed: { index: 2, unit: "km/h" },
      count: { index: 3, unit: "per-shift" },
      surface: { index: 4, unit: "text" },
      direction: { index: 5, unit: "text" },
    },
    defaults: { ...defaults, shiftHours: 10, straightDistancePerHour: 5000 },
  };

  it("turns rows into kinds of turn per operating hour", () => {
    const imp = createScheduleImporter(mapping);
    imp.pushRow(["20", "180", "7.2", "120", "tarmac", "R"], 2);
    imp.pushRow(["", "90", "5", "10", "grass", "left"], 3);
    imp.pushRow(["30", "90", "5", "10", "moon dust", "left"], 4);
    imp.pushRow(["40", "45", "10", "8", "", ""], 5);
    const r = imp.finish();
    expect(r.turns).toHaveLength(2);
    expect(r.turns[1]).toMatchObject({ direction: "left", surface: "firm-soil", perHour: 0.8 });
    expect(r.turns[0]).toMatchObject({
      direction: "right",
      surface: "concrete-asphalt",
      perHour: 12,
      headingChange: 180,
    });
    expect(r.turns[0]!.radius).toBeCloseTo(6.096, 9);
    expect(r.turns[0]!.speed).toBeCloseTo(2, 9);
    expect(r.errors.map((e) => e.line)).toEqual([3, 4]);
    expect(r.errors[1]!.reason).toMatch(/not a surface/);
    expect(r.straight.distancePerHour).toBe(5000);
  });

  it("mapping problems say what to choose", () => {
    expect(mappingProblems({ ...mapping, columns: {} })).toEqual([
      "Choose a turn radius or a steer angle column.",
      "Choose the heading change column.",
      "Choose the speed column.",
      "Choose the column that counts turns per hour or per shift.",
    ]);
  });
});

describe("CSV safety", () => {
  // OWASP "CSV Injection": cells starting with = + - @ tab or CR are run as formulas.
  it.each(["=1+1", "+1", "-1+1", "@SUM(A1)", "\t=1", "\r=1"])("neutralises %j", (v) =>
    expect(neutraliseFormula(v).startsWith("'")).toBe(true),
  );
  it("quotes per RFC 4180 and leaves numbers alone", () => {
    expect(csvField('a "b", c')).toBe('"a ""b"", c"');
    expect(csvField(-1.5)).toBe("-1.5");
    expect(csvField(null)).toBe("");
  });
  it("sniffs files that are not CSV", () => {
    const enc = (s: string) => new TextEncoder().encode(s);
    expect(sniffContent(enc(""))).toBe("empty");
    expect(sniffContent(enc("  \n  "))).toBe("empty");
    expect(sniffContent(enc("<!doctype html><p>x"))).toBe("html");
    expect(sniffContent(new Uint8Array([0x50, 0x4b, 3, 4, 0, 0]))).toBe("binary");
    expect(sniffContent(enc("\ufefftime,speed\n1,2\n"))).toBeUndefined();
    expect(sniffContent(new Uint8Array([0x74, 0x3b, 0xb0, 0x0a]))).toBeUndefined(); // Latin-1 degree sign
  });
});
