import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ZTurnKind } from "@/lib/scrub";
import { fastTurnKind } from "@/lib/scrub/fast-turn-kind";

// The import fast path must agree with the zod schema (the contract): whenever it accepts an
// input, zod accepts it too and produces the identical value.
const anyValue = fc.oneof(
  fc.double(),
  fc.integer({ min: -5, max: 12_000 }),
  fc.constantFrom("left", "right", "gravel", "grass", "laden", "engaged", "crab", "", "  x  "),
  fc.boolean(),
  fc.constant(undefined),
  fc.constant(null),
);
/** Mostly valid values, sometimes anything. */
const mostly = <T>(valid: fc.Arbitrary<T>) =>
  fc.oneof({ arbitrary: valid, weight: 20 }, { arbitrary: anyValue, weight: 1 });
const turnArb = fc
  .record(
    {
      label: mostly(fc.string({ maxLength: 130 })),
      direction: mostly(fc.constantFrom("left", "right")),
      radius: mostly(fc.double({ min: 0, max: 200, noNaN: true })),
      steerInput: mostly(fc.double({ min: 0, max: 95, noNaN: true })),
      headingChange: mostly(fc.double({ min: 0, max: 4000, noNaN: true })),
      crabDistance: mostly(fc.double({ min: 0, max: 50 })),
      speed: mostly(fc.double({ min: 0, max: 25, noNaN: true })),
      surface: mostly(
        fc.constantFrom("concrete-asphalt", "gravel", "firm-soil", "loose-soil", "grass"),
      ),
      loadState: mostly(fc.constantFrom("unladen", "laden")),
      steeringMode: mostly(fc.constantFrom("ideal", "crab", "skid", "four-wheel")),
      frontDrive: mostly(fc.constantFrom("engaged", "disengaged")),
      differentialLock: mostly(fc.boolean()),
      extra: anyValue,
    },
    { requiredKeys: ["direction", "headingChange", "surface"] },
  )
  .map((t) => {
    // Keep "extra" rare so the accepting branch is reached often.
    const { extra, ...rest } = t;
    return typeof extra === "number" && extra > 11_000 ? { ...rest, extra } : rest;
  });
const kindArb = fc.record({
  turn: fc.oneof(turnArb, anyValue),
  perHour: fc.oneof(fc.double({ min: 0, max: 100 }), anyValue),
});

describe("turn-kind fast path", () => {
  it("accepts only what zod accepts, with the identical result", () => {
    let accepted = 0;
    fc.assert(
      fc.property(kindArb, (raw) => {
        const fast = fastTurnKind(raw);
        if (fast === undefined) return;
        accepted++;
        const parsed = ZTurnKind.safeParse(raw);
        expect(parsed.success).toBe(true);
        expect(fast).toStrictEqual(parsed.data);
      }),
      { numRuns: 3000 },
    );
    // The generator must reach the accepting branch often enough for the check to mean much.
    expect(accepted).toBeGreaterThan(60);
  });

  it("takes the plain case (so large imports skip zod's general machinery)", () => {
    const raw = {
      turn: { direction: "left", radius: 6, headingChange: 180, surface: "gravel", label: " U " },
      perHour: 4,
    };
    expect(fastTurnKind(raw)).toStrictEqual(ZTurnKind.parse(raw));
  });
});
