import { describe, expect, it } from "vitest";
import { estimate, leadInTurn } from "@/lib/scrub";
import { lowSpeedTurn, oneTurn, testMachine } from "./fixtures";

const rad = (d: number) => (d * Math.PI) / 180;

describe("layout kinematics at low speed", () => {
  it("rear steer: the outer rear tyre swings out on √((R + T/2)² + L²) (geometry of PHYSICS §3; SAE J695 turning diameter)", () => {
    const L = 3.8;
    const T = 2.6;
    const R = 7;
    const machine = testMachine({ layout: "rear", maxLock: 55 }, { wheelbase: L, track: T });
    const turn = estimate(machine, oneTurn(lowSpeedTurn(R))).turns[0]!;
    expect(turn.turningDiameter).toBeCloseTo(2 * Math.hypot(R + T / 2, L), 9);
    const rearLeft = turn.wheels.find((w) => w.position === "rear-left")!;
    expect(rearLeft.steerAngle).toBeLessThan(0); // steered end swings outward
  });

  it("turntable: wheels run on √(R² + L²) ∓ T/2 about the centre (Wikipedia, Ackermann steering geometry)", () => {
    const L = 3.5;
    const T = 1.8;
    const R = 9;
    const machine = testMachine({ layout: "turntable", maxLock: 60 }, { wheelbase: L, track: T });
    const turn = estimate(machine, oneTurn(lowSpeedTurn(R))).turns[0]!;
    const centre = Math.hypot(R, L);
    expect(turn.wheels[0]!.pathRadius).toBeCloseTo(centre - T / 2, 9);
    expect(turn.wheels[1]!.pathRadius).toBeCloseTo(centre + T / 2, 9);
    expect(turn.steerInput).toBeCloseTo((Math.atan(L / R) * 180) / Math.PI, 9);
  });

  it("symmetric four-wheel steer halves the radius of two-wheel steer for the same angle (Jazar, Vehicle Dynamics [from memory])", () => {
    const L = 2.9;
    const angle = 25;
    const machine = testMachine(
      { layout: "four-wheel", maxLock: 40, rearRatio: 1 },
      { wheelbase: L, track: 1e-3, pivotTrack: 1e-3 },
    );
    const turn = estimate(
      machine,
      oneTurn({ ...lowSpeedTurn(0), radius: undefined, steerInput: angle }),
    ).turns[0]!;
    // Single-track (zero track) limit: R = L/(2 tan δ) at mid-wheelbase.
    expect(turn.radius).toBeCloseTo(L / (2 * Math.tan(rad(angle))), 3);
    expect(turn.turningCentre!.x).toBeCloseTo(0, 9);
  });

  it("front-assist lead in an Ackermann turn matches leadInTurn (front axle speed ratio, PHYSICS §7.2)", () => {
    const machine = {
      ...testMachine({ layout: "ideal", maxLock: 55 }),
      drive: { type: "front-assist" as const, gearRatio: 1.32 },
    };
    for (const R of [5, 9, 20]) {
      const result = estimate(machine, oneTurn(lowSpeedTurn(R)));
      expect(result.turns[0]!.effectiveLead).toBeCloseTo(
        leadInTurn({ lead: result.lead!, wheelbase: 2.6, frontTrack: 1.8, radius: R }),
        9,
      );
    }
  });

  it("crab with parallel wheels translates without scrub; an active Ackermann linkage scrubs", () => {
    const crab = (wheelAngles: "parallel" | "ackermann") =>
      estimate(
        testMachine({ layout: "crab", maxLock: 35, wheelAngles }),
        oneTurn({
          direction: "left",
          steerInput: 20,
          crabDistance: 12,
          headingChange: 0,
          speed: 0,
          surface: "gravel",
        }),
      ).turns[0]!;
    expect(crab("parallel").energy).toBeLessThan(1e-9);
    expect(crab("ackermann").energy).toBeGreaterThan(0);
    expect(crab("ackermann").wheels.every((w) => w.pathRadius === null)).toBe(true);
  });
});
