import { describe, expect, it } from "vitest";
import { guessColumns, guessDecimal, guessKind } from "@/lib/duty-cycles/guess-mapping";
import { mappingProblems } from "@/lib/duty-cycles/column-mapping";

describe("first guess at the column mapping", () => {
  it("reads a telematics header with units in the names", () => {
    const headers = [
      "Timestamp",
      "Speed (mph)",
      "Yaw rate (rad/s)",
      "Latitude",
      "Longitude",
      "Gear",
    ];
    expect(guessKind(headers, 20)).toBe("telematics");
    const columns = guessColumns("telematics", headers, [
      "2026-05-01T06:00:00Z",
      "3.1",
      "0.01",
      "52.1",
      "-1.3",
      "F",
    ]);
    expect(columns).toMatchObject({
      time: { index: 0, unit: "iso8601" },
      speed: { index: 1, unit: "mph" },
      yawRate: { index: 2, unit: "rad/s" },
      lat: { index: 3 },
      lon: { index: 4 },
      direction: { index: 5 },
    });
  });

  it("reads a hand-made turn schedule", () => {
    const headers = [
      "label",
      "radius (m)",
      "heading change (deg)",
      "speed (m/s)",
      "count per shift",
      "surface",
      "direction",
    ];
    expect(guessKind(headers, 4)).toBe("schedule");
    const columns = guessColumns("schedule", headers, undefined);
    expect(columns).toMatchObject({
      radius: { index: 1, unit: "m" },
      headingChange: { index: 2, unit: "deg" },
      speed: { index: 3, unit: "m/s" },
      count: { index: 4, unit: "per-shift" },
      surface: { index: 5 },
      direction: { index: 6 },
      label: { index: 0 },
    });
    expect(
      mappingProblems({
        kind: "schedule",
        delimiter: ",",
        decimal: ".",
        hasHeader: true,
        encoding: "utf-8",
        columns,
        defaults: { surface: "grass", loadState: "unladen", shiftHours: 8, maxSpeed: 20 },
      }),
    ).toEqual([]);
  });

  it("spots decimal commas behind a semicolon separator, and epoch milliseconds", () => {
    expect(
      guessDecimal(";", [
        ["12,5", "3,25"],
        ["13,0", "3,5"],
      ]),
    ).toBe(",");
    expect(guessDecimal(";", [["12.5", "3.25"]])).toBe(".");
    expect(guessDecimal(",", [["12", "5"]])).toBe(".");
    expect(guessColumns("telematics", ["time", "speed"], ["1777870800123", "3"]).time?.unit).toBe(
      "ms",
    );
  });
});
