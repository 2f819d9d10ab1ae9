import { describe, expect, it } from "vitest";
import {
  estimateRollingCircumference,
  frontAxleLead,
  leadInTurn,
  nominalRollingCircumference,
  rollingCircumferenceIndex,
  tyreDimensions,
} from "@/lib/scrub";

describe("rolling circumference index (SAE J2523 relation)", () => {
  // Source: SAE J2523 summary: RCI = round(44·log10(RC/500)), steps of 10^(1/44) ≈ 1.0537.
  it("one index step is a factor 10^(1/44) = 1.0537", () => {
    expect(nominalRollingCircumference(45) / nominalRollingCircumference(44)).toBeCloseTo(
      1.0537,
      3,
    );
  });

  it("round-trips index → circumference → index", () => {
    for (let rci = 20; rci <= 60; rci++) {
      expect(rollingCircumferenceIndex(nominalRollingCircumference(rci))).toBe(rci);
    }
    expect(nominalRollingCircumference(44)).toBe(5000);
  });

  it("480/80R50 estimates to RCI 48 and 420/85R34 to RCI 43 (common practice, no source)", () => {
    const rc = (d: string) => estimateRollingCircumference(tyreDimensions(d).overallDiameter);
    expect(rollingCircumferenceIndex(rc("480/80R50"))).toBe(48);
    expect(rollingCircumferenceIndex(rc("420/85R34"))).toBe(43);
  });
});

describe("front-axle lead", () => {
  // Definition (common practice, no source): λ = (RC_front · ratio − RC_rear)/RC_rear.
  it("computes the lead ratio", () => {
    expect(
      frontAxleLead({ frontCircumference: 4000, rearCircumference: 5200, gearRatio: 1.326 }),
    ).toBeCloseTo((4000 * 1.326) / 5200 - 1, 12);
    expect(
      frontAxleLead({ frontCircumference: 4000, rearCircumference: 5200, gearRatio: 1.3 }),
    ).toBeCloseTo(0, 12);
  });

  it("lead in a turn: with a zero front track the front axle path is √(R²+L²) (Pythagoras)", () => {
    const lead = 0.03;
    const L = 2.7;
    for (const R of [4, 8, 20]) {
      const k = Math.sqrt(R * R + L * L) / R;
      expect(leadInTurn({ lead, wheelbase: L, frontTrack: 0, radius: R })).toBeCloseTo(
        (1 + lead) / k - 1,
        12,
      );
    }
    // Lead is lost as the turn tightens; a very wide turn keeps it (common practice, no source).
    expect(leadInTurn({ lead, wheelbase: L, frontTrack: 1.8, radius: 1e6 })).toBeCloseTo(lead, 6);
    expect(leadInTurn({ lead, wheelbase: L, frontTrack: 1.8, radius: 6 })).toBeLessThan(0);
  });
});
