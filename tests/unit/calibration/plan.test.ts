import { describe, expect, it } from "vitest";
import {
  dueBy,
  hoursPerWeek,
  monthlyOrders,
  planPosition,
  positionAlerts,
  predictPositions,
  type TPlanPositionInput,
  type TReadingPoint,
} from "@/lib/calibration";

const reading = (
  measuredOn: string,
  hourMeter: number,
  depth: number,
  extra: Partial<TReadingPoint> = {},
): TReadingPoint => ({
  position: "rear-left",
  kind: "reading",
  measuredOn,
  hourMeter,
  depthCentre: depth,
  depthInner: depth,
  depthOuter: depth,
  ...extra,
});

describe("usage rate from hour-meter readings", () => {
  it("is the least-squares slope of hours against days, per week", () => {
    // Worked by hand: 1 Mar 1000 h, 15 Mar 1056 h, 29 Mar 1112 h → 56 h per 14 days = 28 h/week.
    const rate = hoursPerWeek([
      { measuredOn: "2026-03-01", hourMeter: 1000 },
      { measuredOn: "2026-03-15", hourMeter: 1056 },
      { measuredOn: "2026-03-29", hourMeter: 1112 },
    ]);
    expect(rate).toBeCloseTo(28, 10);
  });

  it("gives no rate from readings less than a week apart", () => {
    expect(
      hoursPerWeek([
        { measuredOn: "2026-03-01", hourMeter: 10 },
        { measuredOn: "2026-03-04", hourMeter: 30 },
      ]),
    ).toBeNull();
  });
});

describe("plan dates (worked example computed by hand)", () => {
  // Last reading 29 Mar 2026 at 1112 h, 22 mm average; replacement at 8 mm; calibrated wear
  // 2.0 mm per 100 h; 28 h per week.
  // Hours left = (22 − 8) mm ÷ 0.02 mm/h = 700 h → due at 1112 + 700 = 1812 h.
  // Weeks = 700 ÷ 28 = 25 weeks = 175 days → 29 Mar 2026 + 175 days = 20 Sep 2026.
  const input: TPlanPositionInput = {
    machineId: "m1",
    machineName: "Tractor",
    customerId: "c1",
    customerName: "Farm",
    position: "rear-left",
    designation: "520/85R38",
    price: 1800,
    treadDepthReplace: 8,
    wearPer100h: 2,
    calibrated: true,
    readings: [reading("2026-03-01", 1000, 23.5), reading("2026-03-29", 1112, 22)],
    hoursPerWeek: 28,
  };

  it("projects hours left, the due hour meter and the due date", () => {
    const item = planPosition(input);
    expect(item.status).toBe("planned");
    expect(item.hoursLeft).toBeCloseTo(700, 9);
    expect(item.dueHourMeter).toBeCloseTo(1812, 9);
    expect(item.dueOn).toBe("2026-09-20");
  });

  it("moves the date when the wear rate or the usage changes", () => {
    // Twice the usage (56 h/week): 12.5 weeks = 87.5 days → 87 whole days → 24 Jun 2026.
    expect(planPosition({ ...input, hoursPerWeek: 56 }).dueOn).toBe("2026-06-24");
    // Half the wear (1 mm/100 h): 1400 h ÷ 28 = 50 weeks = 350 days → 14 Mar 2027.
    expect(planPosition({ ...input, wearPer100h: 1 }).dueOn).toBe("2027-03-14");
  });

  it("marks a tyre at its replacement depth due now, and one with no reading as unplanned", () => {
    expect(planPosition({ ...input, readings: [reading("2026-03-29", 1112, 7.5)] })).toMatchObject({
      status: "due-now",
      dueOn: "2026-03-29",
    });
    expect(planPosition({ ...input, readings: [] })).toMatchObject({
      status: "no-reading",
      dueOn: null,
    });
    expect(planPosition({ ...input, hoursPerWeek: null })).toMatchObject({
      status: "no-usage",
      dueOn: null,
    });
  });

  it("plans a changed tyre from its new fitment, not the old tyre's readings", () => {
    const item = planPosition({
      ...input,
      readings: [
        reading("2026-03-01", 1000, 9),
        reading("2026-03-29", 1112, 38, { kind: "fitted", designation: "540/65R38" }),
      ],
    });
    // (38 − 8) ÷ 0.02 = 1500 h.
    expect(item.hoursLeft).toBeCloseTo(1500, 9);
    expect(item.designation).toBe("540/65R38");
  });

  it("orders tyres per month with their cost, overdue ones in the first month", () => {
    const a = planPosition(input); // due 2026-09-20
    const b = { ...a, position: "rear-right" as const }; // same month, same size
    const c = { ...a, dueOn: "2026-01-10", designation: "380/85R28", price: 900 }; // overdue
    const lines = monthlyOrders([a, b, c], "2026-04-01", "2027-03-31");
    expect(lines).toEqual([
      { month: "2026-04", designation: "380/85R28", count: 1, unitPrice: 900, total: 900 },
      { month: "2026-09", designation: "520/85R38", count: 2, unitPrice: 1800, total: 3600 },
    ]);
    expect(dueBy([a, c], "2026-06-29").map((i) => i.dueOn)).toEqual(["2026-01-10"]);
  });
});

describe("predicted tread life", () => {
  it("scales each term by its multiplier", () => {
    const [p] = predictPositions(
      [
        {
          position: "front-left",
          designation: "x",
          components: { base: 1, scrub: 0.5 },
          treadDepthNew: 30,
          treadDepthReplace: 10,
          price: 500,
        },
      ],
      { base: 2, scrub: 4 },
    );
    // 2·1 + 4·0.5 = 4 mm/100 h; 20 mm usable → 500 h; 500 ÷ 500 h = 1 per hour.
    expect(p!.wearPer100h.total).toBe(4);
    expect(p!.hoursToReplacement).toBe(500);
    expect(p!.costPerHour).toBe(1);
  });
});

describe("tread alerts", () => {
  it("flags fast wear and one-shoulder wear with the usual causes", () => {
    const alerts = positionAlerts({
      position: "rear-left",
      readings: [
        reading("2026-03-01", 1000, 30),
        reading("2026-03-29", 1100, 25, { depthInner: 21, depthOuter: 25 }),
      ],
      wearPer100h: 1,
      hoursLeft: 500,
      withinHours: 100,
    });
    const kinds = alerts.map((a) => a.kind);
    expect(kinds).toContain("fast-wear");
    expect(kinds).toContain("one-shoulder");
    expect(kinds).not.toContain("due-soon");
    expect(alerts.find((a) => a.kind === "one-shoulder")!.causes.join(" ")).toMatch(/misalignment/);
  });

  it("flags due-soon within the chosen hours and stays quiet on even, expected wear", () => {
    const even = [reading("2026-03-01", 1000, 30), reading("2026-03-29", 1100, 29)];
    expect(
      positionAlerts({
        position: "rear-left",
        readings: even,
        wearPer100h: 1,
        hoursLeft: 80,
        withinHours: 100,
      }).map((a) => a.kind),
    ).toEqual(["due-soon"]);
    expect(
      positionAlerts({
        position: "rear-left",
        readings: even,
        wearPer100h: 1,
        hoursLeft: 800,
        withinHours: 100,
      }),
    ).toEqual([]);
  });
});
