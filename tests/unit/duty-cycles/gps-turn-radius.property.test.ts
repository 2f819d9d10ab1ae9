// Property: a turn read from GPS positions alone has the radius of the path the machine drove
// within 12 % and its heading change within 5°, for logs at 1–10 Hz, 1–4 m/s, with 2–10 cm of
// receiver noise (the goal is 5 %: met on typical headland turns, not yet at the edges of this
// range, see docs/turn-detection.md). Checked with fast-check over generated straight–arc–straight tracks; the
// reference radius is geolib's geodesic length of the noise-free arc (an independent geodesy
// library) divided by the arc's heading change.
import fc from "fast-check";
import { getPathLength, getPreciseDistance } from "geolib";
import { describe, expect, it } from "vitest";
import { segmentTurns } from "@/lib/scrub";
import { samplePath, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";

type TGeoPoint = { latitude: number; longitude: number };
const DEG = Math.PI / 180;

/** Turns a dealer's machines make on a headland: a quarter turn up to a bulb turn. */
const headlandTurn = fc
  .record({
    hz: fc.integer({ min: 1, max: 10 }),
    speed: fc.double({ min: 1, max: 4, noNaN: true }),
    noise: fc.double({ min: 0.02, max: 0.1, noNaN: true }),
    headingChange: fc.double({ min: 90, max: 270, noNaN: true }),
    left: fc.boolean(),
    radiusShare: fc.double({ min: 0, max: 1, noNaN: true }),
    bearing: fc.double({ min: 0, max: 359.9, noNaN: true }),
    seed: fc.integer({ min: 1, max: 1_000_000 }),
  })
  .map((c) => {
    // Radius between 4 m and 30 m, kept to what a machine can drive and a log can show: lateral
    // acceleration v²/R at most 2 m/s², well inside a tractor's tipping limit (common practice,
    // no source), and a yaw rate v/R of at least 6 deg/s, twice the detector's threshold.
    // And an arc of at least 8 m holding at least 8 fixes: sparser arcs are not measured.
    const arcMin = Math.max(8, (8 * c.speed) / c.hz);
    const min = Math.max(4, c.speed ** 2 / 2, arcMin / (c.headingChange * DEG));
    const max = Math.min(30, c.speed / (6 * DEG));
    return { ...c, radius: min + c.radiusShare * Math.max(0, max - min) };
  });

function legsOf(c: { speed: number; radius: number; headingChange: number; left: boolean }) {
  return [
    { kind: "straight", distance: 30, speed: c.speed },
    {
      kind: "arc",
      radius: c.radius,
      headingChange: c.left ? c.headingChange : -c.headingChange,
      speed: c.speed,
    },
    { kind: "straight", distance: 30, speed: c.speed },
  ] satisfies TPathLeg[];
}

/** Radius of the generated arc from geolib's Vincenty length of a 100 Hz noise-free trace. */
function geolibRadius(legs: TPathLeg[], headingChange: number, bearing: number): number {
  const fine = samplePath({ legs: [legs[1]!], hz: 100, bearing0: bearing });
  const points = fine.map((s) => ({ latitude: s.lat, longitude: s.lon }));
  const length = getPathLength(points, (a, b) =>
    getPreciseDistance(a as TGeoPoint, b as TGeoPoint, 0.0001),
  );
  return length / (headingChange * DEG);
}

describe("turn radius and heading change from GPS positions", () => {
  it("are within 12 % and 5° of the driven arc at 1–10 Hz, 1–4 m/s, 2–10 cm noise", () => {
    fc.assert(
      fc.property(headlandTurn, (c) => {
        const legs = legsOf(c);
        const reference = geolibRadius(legs, c.headingChange, c.bearing);
        // The generator draws the arc it was asked for (to within 1 %, sampled at 100 Hz).
        expect(Math.abs(reference - c.radius) / c.radius).toBeLessThan(0.01);
        const path = samplePath({
          legs,
          hz: c.hz,
          bearing0: c.bearing,
          noise: { position: c.noise, speed: 0.05 },
          seed: c.seed,
        });
        const turns = segmentTurns(
          path.map((s) => ({ t: s.t, speed: s.speed, lat: s.lat, lon: s.lon })),
        );
        expect(turns).toHaveLength(1);
        const [turn] = turns as [(typeof turns)[number]];
        expect(turn.direction).toBe(c.left ? "left" : "right");
        expect(Math.abs(turn.radius - reference) / reference).toBeLessThan(0.12);
        expect(Math.abs(turn.headingChange - c.headingChange)).toBeLessThan(5);
      }),
      // A fixed seed keeps CI reproducible; other seeds were run while tuning (docs/turn-detection.md).
      { numRuns: 150, seed: 20261202 },
    );
  }, 60_000);

  it("reads the cases the first look found: 90° of 8 m and 180° of 5 m at 10 Hz, 2 m/s, 5 cm", () => {
    for (const [radius, headingChange] of [
      [8, 90],
      [5, 180],
    ] as const) {
      const legs = legsOf({ speed: 2, radius, headingChange, left: true });
      const path = samplePath({ legs, hz: 10, noise: { position: 0.05, speed: 0.05 }, seed: 7 });
      const turns = segmentTurns(
        path.map((s) => ({ t: s.t, speed: s.speed, lat: s.lat, lon: s.lon })),
      );
      expect(turns).toHaveLength(1);
      expect(Math.abs(turns[0]!.radius - radius) / radius).toBeLessThan(0.05);
      expect(Math.abs(turns[0]!.headingChange - headingChange)).toBeLessThan(5);
    }
  });
});
