import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  estimate,
  ratedLoadAtPressure,
  type TDutyCycleInput,
  type TMachineInput,
} from "@/lib/scrub";
import { testMachine } from "./fixtures";

// Properties of the base-wear and traction model (docs/engine.md, "Base wear and traction"):
// Archard's law (worn volume ∝ normal load × sliding distance), the Brixius traction equations
// (ASABE D497 [M]) and the slip-energy relation E' = F·κ of PHYSICS.md §5.5.

const rated = (m: TMachineInput, front: number, rear: number): TMachineInput => ({
  ...m,
  axles: {
    front: { ...m.axles.front, inflation: { pressure: 160, ratedLoad: front } },
    rear: { ...m.axles.rear, inflation: { pressure: 160, ratedLoad: rear } },
  },
});

const mixedDuty = (draught: number): TDutyCycleInput => ({
  name: "mixed work",
  turns: [
    {
      turn: { direction: "left", radius: 6, headingChange: 180, surface: "firm-soil" },
      perHour: 12,
    },
  ],
  straight: {
    distancePerHour: 8000,
    speed: 3,
    surfaceShares: { "concrete-asphalt": 0.3, "firm-soil": 0.7 },
    drawbarWork: [{ distanceShare: 0.5, surface: "firm-soil", draught }],
  },
});

const scaleLoads = (m: TMachineInput, k: number): TMachineInput => ({
  ...m,
  axles: {
    front: { ...m.axles.front, load: m.axles.front.load * k },
    rear: { ...m.axles.rear, load: m.axles.rear.load * k },
  },
});

const totalWear = (m: TMachineInput, d: TDutyCycleInput) =>
  estimate(m, d).positions.reduce((s, p) => s + p.wearPer100h.total, 0);

describe("base wear responds to load, slip and speed", () => {
  const machine = rated(testMachine(), 2200, 3300);

  it("doubling every axle load raises base wear (was constant before 1.1.0)", () => {
    const road: TDutyCycleInput = {
      name: "road",
      turns: [],
      straight: { distancePerHour: 10_000, speed: 8, surfaceShares: { "concrete-asphalt": 1 } },
    };
    const a = estimate(machine, road).positions[0]!.wearPer100h.base;
    const b = estimate(scaleLoads(machine, 2), road).positions[0]!.wearPer100h.base;
    // (W/W_rated)² with n = 2: four times the base wear.
    expect(b / a).toBeCloseTo(4, 6);
  });

  it("more load never lowers wear on road and yard travel", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 1.5, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0.5, max: 12, noNaN: true }),
        (k, extra, speed) => {
          const duty: TDutyCycleInput = {
            name: "road",
            turns: [],
            straight: { distancePerHour: 6000, speed, surfaceShares: { "concrete-asphalt": 1 } },
          };
          const lighter = totalWear(scaleLoads(machine, k), duty);
          const heavier = totalWear(scaleLoads(machine, k + extra), duty);
          expect(heavier).toBeGreaterThanOrEqual(lighter * (1 - 1e-12));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("more draught never lowers wear", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 15_000, noNaN: true }),
        fc.double({ min: 0, max: 5_000, noNaN: true }),
        (draught, extra) => {
          const a = totalWear(machine, mixedDuty(draught));
          const b = totalWear(machine, mixedDuty(draught + extra));
          expect(b).toBeGreaterThanOrEqual(a * (1 - 1e-12));
        },
      ),
      { numRuns: 40 },
    );
  });

  it("more speed never lowers road wear (rolling resistance rises with V², Wong [M])", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (v, dv) => {
          const duty = (speed: number): TDutyCycleInput => ({
            name: "road",
            turns: [],
            straight: { distancePerHour: 6000, speed, surfaceShares: { "concrete-asphalt": 1 } },
          });
          expect(totalWear(machine, duty(v + dv))).toBeGreaterThanOrEqual(
            totalWear(machine, duty(v)) * (1 - 1e-12),
          );
        },
      ),
      { numRuns: 40 },
    );
  });

  it("a tyre within its rated load at the right pressure wears less than the same tyre overloaded", () => {
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 2, noNaN: true }), (overload) => {
        const duty = mixedDuty(8000);
        const ok = rated(testMachine(), 2200, 3300);
        // Same tyres, axle loads raised until each wheel carries `overload` × its rating.
        const heavy: TMachineInput = {
          ...ok,
          axles: {
            front: { ...ok.axles.front, load: 2 * 2200 * overload },
            rear: { ...ok.axles.rear, load: 2 * 3300 * overload },
          },
        };
        const within = estimate(ok, duty);
        const over = estimate(heavy, duty);
        expect(over.warnings.some((w) => w.code === "load-over-capacity")).toBe(true);
        for (let i = 0; i < 4; i++) {
          expect(over.positions[i]!.wearPer100h.total).toBeGreaterThan(
            within.positions[i]!.wearPer100h.total,
          );
        }
      }),
      { numRuns: 25 },
    );
  });

  it("pressure below what the load needs is flagged as overload", () => {
    const known = { pressure: 160, ratedLoad: 3300 };
    // The load formula's pressure exponent 0.585 [M: Tire and Rim Association]: 100 kPa carries
    // 3300·(100/160)^0.585 kg.
    const low = ratedLoadAtPressure(known, 100);
    expect(low).toBeCloseTo(3300 * Math.pow(100 / 160, 0.585), 6);
    const m = rated(testMachine(), 2200, low);
    const r = estimate(
      { ...m, axles: { ...m.axles, rear: { ...m.axles.rear, load: 2 * 3000 } } },
      mixedDuty(0),
    );
    expect(r.warnings.some((w) => w.code === "load-over-capacity" && /kPa/.test(w.message))).toBe(
      true,
    );
  });

  it("fitted wear coefficients replace the defaults and are reported", () => {
    const duty = mixedDuty(5000);
    const a = estimate(machine, duty);
    const b = estimate(machine, duty, {
      wearCoefficients: { abradability: 0.01, baseWearPerKm: 0.003, loadWearExponent: 1 },
    });
    expect(b.coefficients.abradability).toBe(0.01);
    expect(b.coefficients.baseWearPerKm).toBe(0.003);
    expect(b.coefficients.loadWearExponent).toBe(1);
    expect(b.positions[2]!.wearPer100h.traction).toBeCloseTo(
      a.positions[2]!.wearPer100h.traction * 2,
      9,
    );
  });
});
