import { describe, expect, it } from "vitest";
import { DEFAULT_SURFACES, estimate, ZDutyCycle, type TDutyCycleInput } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { turnKinds, turnTraitsFromInputs } from "@/features/estimates/lib/turn-kinds";

// Invented duty cycle of the kind a builder produces: every block keeps its own rows, so a
// cultivating block writes the same headland turn six times.
const tractor = DEMO_MACHINES.find((m) => m.id === "row-crop-tractor")!.machine;
const headland = {
  label: "Cultivating: headland bulb turn",
  direction: "left" as const,
  radius: 5.5,
  headingChange: 180,
  speed: 1.5,
  surface: "firm-soil" as const,
};
const input: TDutyCycleInput = {
  name: "Spring cultivating",
  turns: [
    ...Array.from({ length: 6 }, () => ({ turn: headland, perHour: 11 / 6 })),
    { turn: { ...headland, direction: "right" as const }, perHour: 4 },
    {
      turn: { ...headland, label: "Gravel yard turn", surface: "gravel" as const, radius: 7 },
      perHour: 3,
    },
  ],
  // Assist disengaged in straight travel: no wind-up, so every joule of scrub comes from turns.
  straight: { distancePerHour: 4000, speed: 2.5, surfaceShares: { "firm-soil": 1 } },
};
const dutyCycle = ZDutyCycle.parse(input);
const result = estimate(tractor, dutyCycle);
const traits = turnTraitsFromInputs({ dutyCycle, machine: tractor }, tractor.steering.layout);
const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

describe("kinds of turn on the estimate page", () => {
  it("merges the six identical rows into one and keeps the mirror-image turn apart", () => {
    const { kinds, varying } = turnKinds(result, traits);
    expect(kinds).toHaveLength(3);
    const merged = kinds.find((k) => k.rows === 6)!;
    expect(merged.label).toBe("Cultivating: headland bulb turn");
    expect(merged.trait?.direction).toBe("left");
    expect(merged.perHour).toBeCloseTo(11, 10);
    expect(kinds.find((k) => k.trait?.direction === "right")!.rows).toBe(1);
    // What tells the kinds apart: direction and surface; speed, load and steering are shared.
    expect([...varying].sort()).toEqual(["direction", "surface"]);
  });

  it("splits all of the scrub energy and scrub wear the engine reports among the kinds", () => {
    const { kinds, straight } = turnKinds(result, traits);
    // Totals from the engine's own per-position result (lateral + longitudinal J/h, scrub mm/h).
    const energy = sum(
      result.positions.map((p) => p.energyPerHour.lateral + p.energyPerHour.longitudinal),
    );
    expect(sum(kinds.map((k) => k.energyPerHour))).toBeCloseTo(energy, 6);
    expect(sum(kinds.map((k) => k.energyShare!))).toBeCloseTo(1, 9);
    expect(sum(kinds.map((k) => k.wearShare!))).toBeCloseTo(1, 9);
    expect(straight.energyShare).toBeCloseTo(0, 9);
    // Scrub cost: each position's cost per hour in proportion to its scrub share of its wear.
    const scrubCost = sum(
      result.positions.map((p) => (p.costPerHour * p.wearPer100h.scrub) / p.wearPer100h.total),
    );
    expect(sum(kinds.map((k) => k.costPerHour!))).toBeCloseTo(scrubCost, 9);
  });

  it("weights wear by the surface's abrasion, so a gravel turn costs more per joule than a soil one", () => {
    const { kinds } = turnKinds(result, traits);
    const gravel = kinds.find((k) => k.trait?.surface === "gravel")!;
    const soil = kinds.find((k) => k.trait?.direction === "right")!;
    const ratio = (k: typeof gravel) => k.wearShare! / k.energyShare!;
    // Abrasion multipliers of the engine's surface table (gravel 2, firm soil 0.35).
    expect(ratio(gravel) / ratio(soil)).toBeCloseTo(
      DEFAULT_SURFACES.gravel.abrasion / DEFAULT_SURFACES["firm-soil"].abrasion,
      1,
    );
    // Costliest first.
    const costs = kinds.map((k) => k.costPerHour!);
    expect([...costs].sort((a, b) => b - a)).toEqual(costs);
  });

  it("leaves wear shares empty for a tracked machine, whose track wear is not modelled", () => {
    const tracked = structuredClone(DEMO_MACHINES.find((m) => m.id === "wheeled-skid-steer")!);
    tracked.machine.steering = { layout: "skid", running: "tracked", contactLength: 1.4 };
    const trackedCycle = ZDutyCycle.parse({
      ...input,
      turns: input.turns.map((k) => ({ ...k, turn: { ...k.turn, radius: 2 } })),
    });
    const r = estimate(tracked.machine, trackedCycle);
    const { kinds } = turnKinds(r, turnTraitsFromInputs({ dutyCycle: trackedCycle }, "skid"));
    expect(kinds.every((k) => k.wearShare === null && k.costPerHour === null)).toBe(true);
    expect(kinds.every((k) => k.energyShare !== null)).toBe(true);
  });
});
