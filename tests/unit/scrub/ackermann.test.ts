import { describe, expect, it } from "vitest";
import {
  angleErrorCurve,
  estimate,
  idealSteerAngles,
  minimumTurningDiameter,
  percentAckermann,
  turningDiameter,
} from "@/lib/scrub";
import { lowSpeedTurn, oneTurn, testMachine } from "./fixtures";

const rad = (d: number) => (d * Math.PI) / 180;
const cot = (d: number) => 1 / Math.tan(rad(d));

describe("Ackermann condition", () => {
  // Source: Wikipedia, "Ackermann steering geometry": cot δo − cot δi = track/wheelbase, with the
  // inner wheel at tan δi = L/(R − T/2) about a centre on the rear-axle line.
  it.each([
    [2.5, 1.5, 5],
    [2.9, 1.9, 7.5],
    [3.8, 2.6, 12],
  ])("L=%s m, T=%s m, R=%s m satisfies cot δo − cot δi = T/L", (L, T, R) => {
    const { inner, outer } = idealSteerAngles({ wheelbase: L, pivotTrack: T, radius: R });
    expect(cot(outer) - cot(inner)).toBeCloseTo(T / L, 12);
    expect(Math.tan(rad(inner))).toBeCloseTo(L / (R - T / 2), 12);
  });

  it("worked example: L = 2.5 m, T = 1.5 m, R = 5 m gives 30.47° inner, 23.50° outer", () => {
    // Values computed by hand from the same source's relations: atan(2.5/4.25), atan(2.5/5.75).
    const { inner, outer } = idealSteerAngles({ wheelbase: 2.5, pivotTrack: 1.5, radius: 5 });
    expect(inner).toBeCloseTo(30.466, 2);
    expect(outer).toBeCloseTo(23.498, 2);
  });

  it("rejects non-positive dimensions with a message naming them", () => {
    expect(() => idealSteerAngles({ wheelbase: 0, pivotTrack: 1, radius: 5 })).toThrow(/wheelbase/);
  });
});

describe("percent Ackermann and turning diameter", () => {
  it("ideal geometry is 100 %, parallel is 0 % in both definitions (Milliken RCVD [from memory])", () => {
    const { inner, outer } = idealSteerAngles({ wheelbase: 2.6, pivotTrack: 1.7, radius: 6 });
    for (const definition of ["toe-out", "cotangent"] as const) {
      expect(
        percentAckermann({ inner, outer, wheelbase: 2.6, pivotTrack: 1.7, definition }),
      ).toBeCloseTo(100, 9);
      expect(
        percentAckermann({ inner, outer: inner, wheelbase: 2.6, pivotTrack: 1.7, definition }),
      ).toBeCloseTo(0, 9);
    }
  });

  it("SAE J695 TD = 2·(WB/sin OTa + OS) matches the engine's outer tyre path for ideal steering", () => {
    // Source: SAE J695 turning-diameter formula for correct geometry, as quoted in summaries.
    const L = 2.6;
    const T = 1.8;
    const pivotTrack = 1.6;
    const R = 6;
    const { outer } = idealSteerAngles({ wheelbase: L, pivotTrack, radius: R });
    const td = turningDiameter({
      wheelbase: L,
      outerAngle: outer,
      scrubRadius: (T - pivotTrack) / 2,
    });
    const result = estimate(
      testMachine({ layout: "ideal", maxLock: 55 }, { wheelbase: L, track: T, pivotTrack }),
      oneTurn(lowSpeedTurn(R)),
    );
    expect(result.turns[0]?.turningDiameter).toBeCloseTo(td, 9);
  });

  it("minimum turning diameter on full lock = SAE J695 TD for ideal steering (ISO 7457 sense)", () => {
    const machine = testMachine({ layout: "ideal", maxLock: 50 }, { track: 1.9, pivotTrack: 1.7 });
    const L = 2.6;
    const outer =
      (Math.atan2(Math.sin(rad(50)), Math.cos(rad(50)) + (1.7 / L) * Math.sin(rad(50))) * 180) /
      Math.PI;
    const td = turningDiameter({ wheelbase: L, outerAngle: outer, scrubRadius: 0.1 });
    expect(minimumTurningDiameter({ machine })).toBeCloseTo(td, 9);
    const crab = { ...machine, otherSteeringModes: [{ layout: "crab" as const, maxLock: 30 }] };
    expect(minimumTurningDiameter({ machine: crab, layout: "crab" })).toBeNull();
  });

  it("angle-error curve: ideal has zero error, parallel has positive error growing with lock", () => {
    const ideal = angleErrorCurve({ machine: testMachine({ layout: "ideal", maxLock: 50 }) });
    expect(Math.max(...ideal.map((p) => Math.abs(p.error)))).toBeLessThan(1e-9);
    const parallel = angleErrorCurve({ machine: testMachine({ layout: "parallel", maxLock: 50 }) });
    expect(parallel.every((p) => p.error > 0 && Math.abs(p.percentAckermann) < 1e-9)).toBe(true);
    for (let i = 1; i < parallel.length; i++) {
      expect(parallel[i]!.error).toBeGreaterThan(parallel[i - 1]!.error);
    }
    expect(parallel.at(-1)?.inner).toBe(50);
  });
});
