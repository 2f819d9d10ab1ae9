import { describe, expect, it } from "vitest";
import { estimate } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { radiusBands, RADIUS_BANDS } from "@/features/estimates/lib/radius-bands";
import { percentsToMix } from "@/features/customers/components/sites-panel";
import { ZSurfaceMix } from "@/features/customers/schemas/site";

describe("radius bands of an estimate", () => {
  it.each(DEMO_MACHINES.map((m) => [m.id]))("%s: bands partition the feasible turns", (id) => {
    const m = DEMO_MACHINES.find((d) => d.id === id)!;
    const result = estimate(m.machine, DEMO_DUTY_CYCLES[id]!);
    const bands = radiusBands(result);
    expect(bands).toHaveLength(RADIUS_BANDS.length);
    const feasible = result.turns.filter((t) => t.feasible);
    const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
    expect(sum(bands.map((b) => b.turnsPerHour))).toBeCloseTo(
      sum(feasible.map((t) => t.perHour)),
      9,
    );
    expect(sum(bands.map((b) => b.energyPerHour))).toBeCloseTo(
      sum(feasible.map((t) => t.energy * t.perHour)),
      6,
    );
    expect(sum(bands.map((b) => b.scrubPerHour))).toBeCloseTo(
      sum(
        feasible.flatMap((t) =>
          t.wheels.map((w) => (w.lateralScrub + w.longitudinalScrub) * t.perHour),
        ),
      ),
      6,
    );
    for (const b of bands) expect(b.meanSlipAngle).toBeGreaterThanOrEqual(0);
  });
});

describe("site surface mix entry", () => {
  it("reads percent boxes as shares, blanks as nothing", () => {
    expect(percentsToMix({ gravel: "25", grass: "75", "firm-soil": "" })).toEqual({
      gravel: 0.25,
      grass: 0.75,
    });
    expect(ZSurfaceMix.safeParse(percentsToMix({ gravel: "25", grass: "70" })).success).toBe(false);
    expect(
      ZSurfaceMix.safeParse(percentsToMix({ gravel: "33.3", grass: "33.3", "firm-soil": "33.4" }))
        .success,
    ).toBe(true);
  });
});
