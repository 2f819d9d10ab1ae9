import { describe, expect, it } from "vitest";
import { getPathLength, getPreciseDistance } from "geolib";
import { segmentTurns, wrapDegrees, type TTurnSample } from "@/lib/scrub";
import {
  gaussian,
  samplePath,
  seededRandom,
  type TPathLeg,
  type TPathSample,
} from "@/lib/duty-cycles/synthetic-path";

/**
 * Known answers come from the generated geometry itself: an arc of radius R through heading
 * change Δψ has length R·Δψ (circle geometry). Distances along the GPS track are cross-checked
 * with geolib, an independent geodesy library (haversine path length).
 */
const WHEELBASE = 2.8;

type TGeoPoint = { latitude: number; longitude: number };
type TDetected = ReturnType<typeof segmentTurns>[number];
/** geolib's path length with Vincenty distances to the millimetre (its default rounds to 1 m). */
const geolibLength = (points: TGeoPoint[]) =>
  getPathLength(points, (a, b) => getPreciseDistance(a as TGeoPoint, b as TGeoPoint, 0.001));

function only(samples: TPathSample[], pick: (s: TPathSample) => TTurnSample): TTurnSample[] {
  return samples.map(pick);
}

const bySource = {
  "yaw rate": (s: TPathSample) => ({ t: s.t, speed: s.speed, yawRate: s.yawRate }),
  "steer angle": (s: TPathSample) => ({ t: s.t, speed: s.speed, steer: s.steer }),
  "compass heading": (s: TPathSample) => ({ t: s.t, speed: s.speed, heading: s.heading }),
  "GPS positions": (s: TPathSample) => ({ t: s.t, speed: s.speed, lat: s.lat, lon: s.lon }),
} as const;

const noiseBySource = {
  "yaw rate": { yawRate: 0.8, speed: 0.05 },
  "steer angle": { steer: 0.5, speed: 0.05 },
  "compass heading": { heading: 0.8, speed: 0.05 },
  // 5 cm: about what a corrected tractor guidance receiver gives (from memory, no source).
  "GPS positions": { position: 0.05, speed: 0.05 },
} as const;

const uTurnField: TPathLeg[] = [
  { kind: "straight", distance: 60, speed: 3 },
  { kind: "arc", radius: 6, headingChange: 180, speed: 2 },
  { kind: "straight", distance: 60, speed: 3 },
  { kind: "arc", radius: 12, headingChange: -90, speed: 2.5 },
  { kind: "straight", distance: 40, speed: 3 },
];

describe("the engine entry @/lib/scrub", () => {
  it("exports segmentTurns(samples, options) returning turns in the documented shape", () => {
    expect(typeof segmentTurns).toBe("function");
    const path = samplePath({ legs: uTurnField, seed: 2 });
    const [turn] = segmentTurns(
      path.map((s) => ({ t: s.t, speed: s.speed, yawRate: s.yawRate })),
      { wheelbase: WHEELBASE },
    );
    expect(Object.keys(turn!)).toEqual(
      expect.arrayContaining([
        "start",
        "end",
        "headingChange",
        "radius",
        "speed",
        "distance",
        "direction",
      ]),
    );
    expect(turn!.end).toBeGreaterThan(turn!.start);
  });
});

describe("segmentTurns on generated paths with known turns", () => {
  for (const [source, pick] of Object.entries(bySource)) {
    it(`finds a 180° left U-turn of 6 m and a 90° right turn of 12 m from ${source} with noise`, () => {
      const path = samplePath({
        legs: uTurnField,
        wheelbase: WHEELBASE,
        noise: noiseBySource[source as keyof typeof noiseBySource],
        seed: 7,
      });
      const turns = segmentTurns(only(path, pick), { wheelbase: WHEELBASE });
      expect(turns).toHaveLength(2);
      const [u, r] = turns as [(typeof turns)[0], (typeof turns)[0]];
      expect(u.direction).toBe("left");
      expect(u.headingChange).toBeGreaterThan(170);
      expect(u.headingChange).toBeLessThan(190);
      expect(u.radius).toBeGreaterThan(5.2);
      expect(u.radius).toBeLessThan(6.8);
      expect(u.speed).toBeGreaterThan(1.8);
      expect(u.speed).toBeLessThan(2.4);
      expect(r.direction).toBe("right");
      expect(r.headingChange).toBeGreaterThan(82);
      expect(r.headingChange).toBeLessThan(98);
      expect(r.radius).toBeGreaterThan(10.5);
      expect(r.radius).toBeLessThan(13.5);
      // Arc length R·Δψ = 6·π ≈ 18.85 m (circle geometry); detection may add a little straight.
      expect(u.distance).toBeGreaterThan(16.5);
      expect(u.distance).toBeLessThan(22);
    });
  }

  it("reads both arcs of an S-bend with 10 m between them from GPS positions alone", () => {
    // Each turn's fit keeps to its own fixes: the run-out of the first stops where the second
    // begins, the run-in of the second starts where the first ended. Known answers: the
    // generated arcs (90° of 8 m left, 120° of 12 m right).
    const legs: TPathLeg[] = [
      { kind: "straight", distance: 30, speed: 2 },
      { kind: "arc", radius: 8, headingChange: 90, speed: 2 },
      { kind: "straight", distance: 10, speed: 2 },
      { kind: "arc", radius: 12, headingChange: -120, speed: 2 },
      { kind: "straight", distance: 30, speed: 2 },
    ];
    for (const hz of [5, 10]) {
      for (const seed of [3, 4]) {
        const path = samplePath({ legs, hz, noise: { position: 0.05, speed: 0.05 }, seed });
        const turns = segmentTurns(only(path, bySource["GPS positions"]));
        expect(turns.map((t) => t.direction)).toEqual(["left", "right"]);
        const [a, b] = turns as [TDetected, TDetected];
        expect(Math.abs(a.radius - 8) / 8).toBeLessThan(0.05);
        expect(Math.abs(a.headingChange - 90)).toBeLessThan(5);
        expect(Math.abs(b.radius - 12) / 12).toBeLessThan(0.05);
        expect(Math.abs(b.headingChange - 120)).toBeLessThan(5);
      }
    }
  });

  it("turn distance matches geolib's haversine length of the same stretch of GPS track", () => {
    const path = samplePath({ legs: uTurnField, seed: 3 });
    const [u] = segmentTurns(
      path.map((s) => ({ t: s.t, speed: s.speed, lat: s.lat, lon: s.lon })),
      {},
    );
    expect(u).toBeDefined();
    const stretch = path
      .filter((s) => s.t >= u!.start && s.t <= u!.end)
      .map((s) => ({ latitude: s.lat, longitude: s.lon }));
    const length = geolibLength(stretch);
    expect(length).toBeGreaterThan(15);
    expect(Math.abs(u!.distance - length) / length).toBeLessThan(0.03);
  });

  it("finds a full 360° circle of 20 m radius, its length 2πR checked with geolib", () => {
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 30, speed: 4 },
        { kind: "arc", radius: 20, headingChange: 360, speed: 4 },
        { kind: "straight", distance: 30, speed: 4 },
      ],
      noise: { yawRate: 0.5 },
      seed: 11,
    });
    const turns = segmentTurns(path.map((s) => ({ t: s.t, speed: s.speed, yawRate: s.yawRate })));
    expect(turns).toHaveLength(1);
    expect(turns[0]!.headingChange).toBeGreaterThan(350);
    expect(turns[0]!.headingChange).toBeLessThan(370);
    expect(turns[0]!.radius).toBeCloseTo(20, 0);
    const circle = path
      .filter((s) => s.t >= turns[0]!.start && s.t <= turns[0]!.end)
      .map((s) => ({ latitude: s.lat, longitude: s.lon }));
    // geolib's haversine length of the same samples agrees with our speed-integrated distance.
    expect(Math.abs(geolibLength(circle) - turns[0]!.distance)).toBeLessThan(1);
    expect(Math.abs(turns[0]!.distance - 2 * Math.PI * 20)).toBeLessThan(4);
  });

  it("reports a skid steer's pivot on the spot at zero speed with radius 0", () => {
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 10, speed: 1.5 },
        { kind: "stop", duration: 1 },
        { kind: "pivot", headingChange: -90, yawRate: -45 },
        { kind: "stop", duration: 1 },
        { kind: "straight", distance: 10, speed: 1.5 },
      ],
      noise: { yawRate: 0.5 },
      seed: 5,
    });
    const turns = segmentTurns(path.map((s) => ({ t: s.t, speed: s.speed, yawRate: s.yawRate })));
    expect(turns).toHaveLength(1);
    expect(turns[0]).toMatchObject({ pivot: true, radius: 0, direction: "right" });
    expect(turns[0]!.headingChange).toBeGreaterThan(85);
    expect(turns[0]!.headingChange).toBeLessThan(95);
  });

  it("marks a turn driven in reverse, from GPS with the reverse flag and from steer angle", () => {
    const legs: TPathLeg[] = [
      { kind: "straight", distance: 15, speed: 2 },
      { kind: "stop", duration: 1 },
      { kind: "arc", radius: 5, headingChange: 90, speed: 1.5, reverse: true },
      { kind: "stop", duration: 1 },
      { kind: "straight", distance: 15, speed: 2 },
    ];
    const path = samplePath({ legs, wheelbase: WHEELBASE, seed: 9 });
    const gps = segmentTurns(
      path.map((s) => ({
        t: s.t,
        speed: Math.abs(s.speed),
        reverse: s.speed < 0,
        lat: s.lat,
        lon: s.lon,
      })),
    );
    const steer = segmentTurns(
      path.map((s) => ({ t: s.t, speed: s.speed, steer: s.steer })),
      { wheelbase: WHEELBASE },
    );
    for (const turns of [gps, steer]) {
      expect(turns).toHaveLength(1);
      expect(turns[0]!.reverse).toBe(true);
      // Reversing with the wheels to the left swings the machine's nose to the right.
      expect(turns[0]!.direction).toBe("right");
      expect(turns[0]!.headingChange).toBeGreaterThan(80);
      expect(turns[0]!.headingChange).toBeLessThan(100);
      expect(turns[0]!.radius).toBeGreaterThan(4);
      // GPS course is taken over a 2 m baseline, coarse on a 7.9 m arc: a looser upper bound.
      expect(turns[0]!.radius).toBeLessThan(6.5);
    }
  });

  it("does not invent turns from GPS jitter while the machine stands still", () => {
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 20, speed: 2 },
        { kind: "stop", duration: 120 },
        { kind: "straight", distance: 6, speed: 0.2 },
        { kind: "straight", distance: 20, speed: 2 },
      ],
    });
    // Receiver wander of about 1 m while stopped or creeping, as an uncorrected fix shows (from memory).
    const random = seededRandom(13);
    const metre = 1 / 111_320;
    const turns = segmentTurns(
      path.map((s) => {
        const slow = Math.abs(s.speed) < 0.5;
        return {
          t: s.t,
          speed: s.speed,
          lat: s.lat + (slow ? gaussian(random) * metre : 0),
          lon: s.lon + (slow ? (gaussian(random) * metre) / Math.cos((52.1 * Math.PI) / 180) : 0),
        };
      }),
    );
    expect(turns).toHaveLength(0);
  });

  it("unwraps compass heading across north (a 120° right turn starting at 300°)", () => {
    expect(wrapDegrees(10 - 350)).toBe(20);
    expect(wrapDegrees(350 - 10)).toBe(-20);
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 20, speed: 3 },
        { kind: "arc", radius: 10, headingChange: -120, speed: 3 },
        { kind: "straight", distance: 20, speed: 3 },
      ],
      bearing0: 300,
    });
    const turns = segmentTurns(path.map((s) => ({ t: s.t, speed: s.speed, heading: s.heading })));
    expect(turns).toHaveLength(1);
    expect(turns[0]!.direction).toBe("right");
    expect(turns[0]!.headingChange).toBeCloseTo(120, 0);
  });

  it("ends an open turn at a gap in the log instead of joining across it", () => {
    const path = samplePath({
      legs: [
        { kind: "straight", distance: 10, speed: 2 },
        { kind: "arc", radius: 8, headingChange: 90, speed: 2 },
        { kind: "straight", distance: 10, speed: 2 },
      ],
    });
    const shifted = path.map((s, i) => ({
      t: s.t + (i > path.length / 2 ? 600 : 0),
      speed: s.speed,
      yawRate: s.yawRate,
    }));
    const turns = segmentTurns(shifted);
    expect(turns.every((t) => t.end - t.start < 60)).toBe(true);
  });
});
