import { describe, expect, it } from "vitest";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { estimate, type TMachineInput } from "@/lib/scrub";
import {
  buildReportContent,
  formatReportMoney,
  formatReportRate,
  paybackOf,
  reportFileName,
  reportStatus,
} from "@/lib/reports";

describe("paybackOf (simple payback: cost / saving per hour; common practice, no source)", () => {
  it("divides the one-off cost by the hourly saving", () => {
    // Worked by hand: £600 repaid at £0.40 per hour takes 1,500 h.
    expect(paybackOf(600, 0.4)).toBeCloseTo(1500, 9);
  });
  it("never pays back without a saving, and at once when free", () => {
    expect(paybackOf(600, 0)).toBeNull();
    expect(paybackOf(600, -0.1)).toBeNull();
    expect(paybackOf(0, 0.2)).toBe(0);
  });
});

describe("reportStatus", () => {
  it.each([
    [{ version: null, latestVersion: 0, activeShares: 0, opened: false }, "draft"],
    [{ version: 1, latestVersion: 2, activeShares: 1, opened: true }, "superseded"],
    [{ version: 2, latestVersion: 2, activeShares: 0, opened: false }, "issued"],
    [{ version: 2, latestVersion: 2, activeShares: 1, opened: false }, "shared"],
    [{ version: 2, latestVersion: 2, activeShares: 1, opened: true }, "opened"],
  ] as const)("%o → %s", (row, status) => {
    expect(reportStatus(row)).toBe(status);
  });
});

describe("reportFileName", () => {
  it("builds a safe name from customer, machine and version", () => {
    expect(
      reportFileName({
        customer: "Hollin Vale Farm",
        machine: "Tarnbeck-style 140 hp!",
        version: 2,
        ext: "pdf",
      }),
    ).toBe("hollin-vale-farm-tarnbeck-style-140-hp-v2.pdf");
    expect(
      reportFileName({
        customer: "Ærø Gård",
        machine: "",
        version: 1,
        ext: "csv",
        suffix: "turns",
      }),
    ).toBe("r-gard-v1-turns.csv");
  });
});

describe("formatReportMoney", () => {
  it("shows the currency with the amount (Intl.NumberFormat, ECMA-402)", () => {
    expect(formatReportMoney(1234.5, "GBP")).toBe("£1,234.50");
    expect(formatReportMoney(1.2, "EUR")).toBe("€1.20");
    expect(formatReportMoney(null, "GBP")).toBe("—");
  });
});

describe("buildReportContent", () => {
  const base = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine as TMachineInput;
  const cycle = DEMO_DUTY_CYCLES["row-crop-tractor"]!;
  const ideal: TMachineInput = { ...base, steering: { layout: "ideal", maxLock: 52 } };
  const content = buildReportContent({
    kind: "comparison",
    title: "Two set-ups",
    currency: "GBP",
    dealership: { name: "Test dealership", contactLine: "" },
    customer: { name: "Test farm", contactName: null },
    dutyCycle: cycle,
    options: [
      {
        key: "a",
        label: "As fitted",
        baseline: true,
        estimateId: null,
        oneOffCost: 0,
        machine: base,
        result: estimate(base, cycle),
      },
      {
        key: "b",
        label: "Ideal",
        baseline: false,
        estimateId: null,
        oneOffCost: 500,
        machine: ideal,
        result: estimate(ideal, cycle),
      },
    ],
    recommendations: "",
    customerNote: "",
    issuedAt: new Date("2026-12-02T00:00:00Z"),
    issuedBy: "Tester",
  });

  it("measures saving and payback against the baseline", () => {
    const [a, b] = content.options;
    expect(a!.savingPerHour).toBeNull();
    expect(b!.savingPerHour).toBeCloseTo(a!.costPerHour - b!.costPerHour, 12);
    expect(b!.paybackHours).toEqual(paybackOf(500, b!.savingPerHour!));
  });

  it("recommends the lowest cost per hour and keeps the sources and cautions", () => {
    const lowest = [...content.options].sort((x, y) => x.costPerHour - y.costPerHour)[0]!;
    expect(content.recommendedKey).toBe(lowest.key);
    expect(content.assumptions.every((x) => x.source.length > 0)).toBe(true);
    expect(content.cautions.map((c) => c.code)).toContain("mounting-hazard");
    expect(content.dutyCycle.turnKinds).toBe(cycle.turns.length);
  });

  it("prices each position's replacement from its axle's tyre", () => {
    const front = content.options[0]!.positions.find((p) => p.position === "front-left")!;
    expect(front.replacementCost).toBe(base.axles.front.tyre.price);
  });
});

describe("buildReportContent with a calibration", () => {
  const machine = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine as TMachineInput;
  const cycle = DEMO_DUTY_CYCLES["row-crop-tractor"]!;
  const build = (calibration: Parameters<typeof buildReportContent>[0]["calibration"]) =>
    buildReportContent({
      kind: "estimate",
      title: "Calibrated",
      currency: "GBP",
      dealership: { name: "Test dealership", contactLine: "" },
      customer: { name: "Test farm", contactName: null },
      dutyCycle: cycle,
      options: [
        {
          key: "current",
          label: "As fitted",
          baseline: true,
          estimateId: null,
          oneOffCost: 0,
          machine,
          result: estimate(machine, cycle),
        },
      ],
      recommendations: "",
      customerNote: "",
      issuedAt: new Date("2026-12-02T00:00:00Z"),
      issuedBy: "Tester",
      calibration,
    });

  it("says the figures are calibrated, on what readings, and marks every position", () => {
    const content = build({
      source: "machine",
      multipliers: { base: 1.3, scrub: 0.8 },
      r2: 0.91,
      n: 24,
      hoursCovered: 640,
    });
    const note = content.assumptions.find((a) => a.topic === "Calibration")!;
    expect(note.text).toContain("calibrated from 24 of this machine's tread readings over 640");
    expect(note.text).toContain("rolling wear × 1.30, scrub wear × 0.80");
    expect(content.options[0]!.positions.every((p) => p.calibrated)).toBe(true);
  });

  it("says the defaults are uncalibrated when there is none", () => {
    const content = build(null);
    const note = content.assumptions.find((a) => a.topic === "Calibration")!;
    expect(note.text).toMatch(/uncalibrated defaults/);
    expect(content.options[0]!.positions.some((p) => p.calibrated)).toBe(false);
  });
});

describe("formatReportRate", () => {
  it("keeps a third decimal below 10 per hour, so close options stay apart (ECMA-402 rounding)", () => {
    expect(formatReportRate(0.5741, "GBP")).toBe("£0.574/h");
    expect(formatReportRate(0.5665, "GBP")).toBe("£0.567/h");
    expect(formatReportRate(12.345, "EUR")).toBe("€12.35/h");
    expect(formatReportRate(Infinity, "GBP")).toBe("—");
  });
});
