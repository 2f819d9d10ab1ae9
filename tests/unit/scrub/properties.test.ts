import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { estimate, type TMachineInput, type TTurnInput } from "@/lib/scrub";
import { lowSpeedTurn, oneTurn, testMachine } from "./fixtures";

// Property tests (fast-check). The claims come from the kinematics in Wikipedia "Ackermann
// steering geometry" (zero slip when all spin axes meet at one centre) and from scrub being
// proportional to the heading change for a steady turn (PHYSICS.md §5.5).

const turnOf = (machine: TMachineInput, turn: TTurnInput) =>
  estimate(machine, oneTurn(turn)).turns[0]!;
const totalScrub = (machine: TMachineInput, turn: TTurnInput) =>
  turnOf(machine, turn).wheels.reduce((s, w) => s + w.lateralScrub, 0);

const ZERO_SLIP_LAYOUTS: { name: string; machine: TMachineInput; minRadius: number }[] = [
  { name: "ideal", machine: testMachine({ layout: "ideal", maxLock: 55 }), minRadius: 2.8 },
  { name: "turntable", machine: testMachine({ layout: "turntable", maxLock: 60 }), minRadius: 1.6 },
  { name: "rear steer", machine: testMachine({ layout: "rear", maxLock: 55 }), minRadius: 2.8 },
  {
    name: "four-wheel steer",
    machine: testMachine({ layout: "four-wheel", maxLock: 40, rearRatio: 0.7 }),
    minRadius: 3,
  },
  {
    name: "articulated",
    machine: testMachine({
      layout: "articulated",
      frontLength: 1.2,
      rearLength: 1.5,
      maxArticulation: 40,
    }),
    minRadius: 3.7,
  },
];

describe("scrub properties", () => {
  it.each(ZERO_SLIP_LAYOUTS)(
    "$name geometry: zero slip and zero scrub at any feasible radius",
    ({ machine, minRadius }) => {
      fc.assert(
        fc.property(
          fc.double({ min: minRadius, max: 300, noNaN: true }),
          fc.constantFrom("left", "right"),
          (radius, direction) => {
            const turn = turnOf(machine, lowSpeedTurn(radius, { direction }));
            expect(turn.feasible).toBe(true);
            for (const w of turn.wheels) {
              expect(Math.abs(w.slipAngle)).toBeLessThan(1e-7);
              expect(w.lateralScrub).toBeLessThan(1e-7);
            }
          },
        ),
        { numRuns: 60 },
      );
    },
  );

  it("left and right turns mirror", () => {
    const machine = testMachine({ layout: "parallel", maxLock: 55 });
    fc.assert(
      fc.property(fc.double({ min: 3, max: 60, noNaN: true }), (radius) => {
        const left = turnOf(machine, lowSpeedTurn(radius));
        const right = turnOf(machine, lowSpeedTurn(radius, { direction: "right" }));
        const pairs = [
          [0, 1],
          [1, 0],
          [2, 3],
          [3, 2],
        ] as const;
        for (const [a, b] of pairs) {
          expect(right.wheels[b]!.steerAngle).toBeCloseTo(-left.wheels[a]!.steerAngle, 9);
          expect(right.wheels[b]!.slipAngle).toBeCloseTo(-left.wheels[a]!.slipAngle, 9);
          expect(right.wheels[b]!.energy).toBeCloseTo(left.wheels[a]!.energy, 6);
        }
        expect(right.turningCentre!.y).toBeCloseTo(-left.turningCentre!.y, 9);
      }),
      { numRuns: 40 },
    );
  });

  it("scrub grows linearly with heading change", () => {
    const machine = testMachine({ layout: "parallel", maxLock: 55 });
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 40, noNaN: true }),
        fc.double({ min: 1, max: 720, noNaN: true }),
        (radius, heading) => {
          const base = totalScrub(machine, lowSpeedTurn(radius, { headingChange: 90 }));
          const scaled = totalScrub(machine, lowSpeedTurn(radius, { headingChange: heading }));
          expect(scaled / base).toBeCloseTo(heading / 90, 9);
        },
      ),
      { numRuns: 40 },
    );
  });

  it("parallel steering scrubs more than ideal at every radius, and the gap grows as the radius shrinks", () => {
    const parallel = testMachine({ layout: "parallel", maxLock: 55 });
    const ideal = testMachine({ layout: "ideal", maxLock: 55 });
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 80, noNaN: true }),
        fc.double({ min: 1.05, max: 3, noNaN: true }),
        (r1, factor) => {
          const r2 = r1 * factor;
          const gap = (r: number) =>
            totalScrub(parallel, lowSpeedTurn(r)) - totalScrub(ideal, lowSpeedTurn(r));
          expect(gap(r1)).toBeGreaterThan(0);
          expect(gap(r1)).toBeGreaterThan(gap(r2));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("a narrower track brings parallel steering closer to ideal", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 4, max: 40, noNaN: true }),
        fc.double({ min: 1.0, max: 1.8, noNaN: true }),
        fc.double({ min: 0.05, max: 0.8, noNaN: true }),
        (radius, narrow, extra) => {
          const scrub = (track: number) =>
            totalScrub(
              testMachine({ layout: "parallel", maxLock: 55 }, { track }),
              lowSpeedTurn(radius),
            );
          expect(scrub(narrow)).toBeLessThan(scrub(narrow + extra));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("frictional energy is never negative", () => {
    const machines = [
      testMachine({ layout: "parallel", maxLock: 55 }),
      testMachine({
        layout: "trapezoid",
        maxLock: 50,
        armLength: 0.2,
        armAngle: 18,
        tieRod: "behind",
      }),
      testMachine({ layout: "crab", maxLock: 40, wheelAngles: "ackermann" }),
      { ...testMachine({ layout: "skid" }), drive: { type: "4wd" as const } },
      {
        ...testMachine({ layout: "parallel", maxLock: 55 }),
        drive: { type: "front-assist" as const, gearRatio: 1.4 },
      },
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...machines),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 4, noNaN: true }),
        fc.constantFrom("concrete-asphalt", "gravel", "firm-soil", "loose-soil", "grass" as const),
        fc.boolean(),
        (machine, radius, speed, surface, differentialLock) => {
          const crab = machine.steering.layout === "crab";
          const turn: TTurnInput = crab
            ? {
                direction: "left",
                steerInput: Math.min(radius, 40),
                crabDistance: 10,
                headingChange: 0,
                speed,
                surface,
              }
            : { direction: "right", radius, headingChange: 120, speed, surface, differentialLock };
          const result = estimate(machine, oneTurn(turn, 5, 1000));
          for (const w of result.turns[0]!.wheels) {
            expect(w.lateralEnergy).toBeGreaterThanOrEqual(0);
            expect(w.longitudinalEnergy).toBeGreaterThanOrEqual(0);
          }
          for (const p of result.positions) expect(p.energyPerHour.total).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 120 },
    );
  });

  it("a machine turning with no kinematic conflict wears only by the base term", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 100, noNaN: true }),
        fc.double({ min: 100, max: 20_000, noNaN: true }),
        (radius, straight) => {
          const result = estimate(
            testMachine({ layout: "ideal", maxLock: 55 }),
            oneTurn(lowSpeedTurn(radius), 30, straight),
          );
          for (const p of result.positions) {
            expect(p.wearPer100h.scrub).toBeLessThan(1e-12);
            expect(p.wearPer100h.base).toBeGreaterThan(0);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});
