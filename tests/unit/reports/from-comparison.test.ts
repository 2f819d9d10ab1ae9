import { describe, expect, it } from "vitest";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import {
  compareOptions,
  type TComparisonResult,
  type TMachineInput,
  type TOptionSpec,
} from "@/lib/scrub";
import { buildReportContent } from "@/lib/reports";
import { comparisonOptionSources, ComparisonOutdatedError } from "@/lib/reports/from-comparison";

// Invented demo data: the demo row-crop tractor and two priced changes.
const machine = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine as TMachineInput;
const dutyCycle = DEMO_DUTY_CYCLES["row-crop-tractor"]!;
const priced: TOptionSpec[] = [
  {
    name: "Ackermann-corrected linkage",
    changes: [{ kind: "steering", steering: { layout: "ideal", maxLock: 52 } }],
    oneOffCost: 1800,
  },
  {
    name: "Narrower front track",
    changes: [{ kind: "parameter", parameter: "frontTrack", value: 1.8 }],
    oneOffCost: 600,
  },
];
/** As option_studies stores it: through JSON. */
const stored = (): TComparisonResult =>
  JSON.parse(JSON.stringify(compareOptions(machine, dutyCycle, priced, { hours: 2000 })));
const sources = (result: TComparisonResult) =>
  comparisonOptionSources({ machine, dutyCycle, result, baselineDescription: "as fitted" });

describe("comparisonOptionSources", () => {
  it("gives the machine as fitted and every priced option, reproducing the stored figures", () => {
    const result = stored();
    const out = sources(result);
    expect(out.map((o) => [o.label, o.baseline, o.oneOffCost])).toEqual([
      ["As fitted today", true, 0],
      ["Ackermann-corrected linkage", false, 1800],
      ["Narrower front track", false, 600],
    ]);
    expect(out[0]!.result.costPerHour).toBeCloseTo(result.current.costPerHour, 12);
    out.slice(1).forEach((o, i) => {
      expect(o.result.costPerHour).toBeCloseTo(result.options[i]!.costPerHour, 12);
      expect(o.reasons).toEqual(result.options[i]!.reasons);
      // Per-turn detail for the annex, which the stored comparison leaves out.
      expect(o.result.turns.length).toBe(dutyCycle.turns.length);
    });
    expect(out[2]!.machine.axles.front.track).toBe(1.8);
    expect(out[2]!.cautions!.map((c) => c.code)).toEqual(["option-track"]);
  });

  it("refuses a comparison run by another engine version, or whose figures no longer match", () => {
    expect(() => sources({ ...stored(), engineVersion: "0.0.1" })).toThrow(ComparisonOutdatedError);
    const drifted = stored();
    drifted.options[1]!.costPerHour *= 1.01;
    expect(() => sources(drifted)).toThrow(/"Narrower front track" no longer match/);
  });

  it("never recommends an option that is not workable, however cheap", () => {
    const out = sources(stored());
    const cheapest = [...out].sort((a, b) => a.result.costPerHour - b.result.costPerHour)[0]!;
    const content = buildReportContent({
      kind: "comparison",
      title: "t",
      currency: "GBP",
      dealership: { name: "d", contactLine: "" },
      customer: { name: "c", contactName: null },
      dutyCycle,
      options: out.map((o) => (o === cheapest ? { ...o, feasible: false } : o)),
      recommendations: "",
      customerNote: "",
      issuedAt: new Date("2026-12-02T00:00:00Z"),
      issuedBy: "Tester",
    });
    expect(content.recommendedKey).not.toBeNull();
    expect(content.recommendedKey).not.toBe(cheapest.key);
    expect(content.options.find((o) => o.key === cheapest.key)!.feasible).toBe(false);
  });
});
