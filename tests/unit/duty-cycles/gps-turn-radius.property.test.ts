// Property: a turn read from GPS positions alone has the radius of the path the machine drove
// within 5 % and its heading change within 5°, for logs at 1–10 Hz, 1–4 m/s, with 2–10 cm of
// receiver noise. Checked with fast-check over generated straight–arc–straight tracks; the
// reference radius is geolib's geodesic length of the noise-free arc (an independent geodesy
// library) divided by the arc's heading change.
//
// One exception, and it is not a narrower domain: where the fixes themselves do not hold the
// radius to 5 %, no method can read it to 5 %. The Cramér–Rao bound (any unbiased estimate's
// variance is at least the inverse of the Fisher information; for curves fitted to points with
// Gaussian noise see N. Chernov, "Circular and Linear Regression", CRC Press 2010, ch. 6–7,
// from memory) gives the smallest standard error of the radius a track's fixes allow. On a
// quarter turn of 5 m driven at 1 m/s and logged at 1 Hz with 10 cm noise (8 fixes on the arc,
// a real case: a slow loader, a sparse log) it is 3 %, so one read in ten is off by more than
// 5 % whatever the method. Where four standard errors exceed 5 % (about 5 % of the cases drawn
// here, which favour the edges of the range: turns of 90° to about 135°, 4–16 m, 4–10 cm
// noise), the test asks for the radius within four standard errors instead. The generator's
// domain is not narrowed; measured figures and the method: docs/turn-detection.md.
import fc from "fast-check";
import { getPathLength, getPreciseDistance } from "geolib";
import { Matrix, inverse } from "ml-matrix";
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

/**
 * Cramér–Rao lower bound on the relative standard error of the radius, for the fixes the log
 * holds on this track (straights of 30 m, a fix every v/hz metres from the start, noise σ in
 * each axis): σ²(JᵀJ)⁻¹, where row i of J holds the derivatives of fix i's distance from the
 * path with respect to the arc's centre (2), radius and the angles of its two tangent points.
 * Computed with ml-matrix in a frame of our choice (the bound does not depend on it).
 */
function radiusStandardError(c: {
  hz: number;
  speed: number;
  noise: number;
  radius: number;
  headingChange: number;
}): number {
  const straight = 30;
  const r = c.radius;
  const sweep = c.headingChange * DEG;
  const arc = r * sweep;
  const theta0 = -Math.PI / 2; // entry along +x, tangent point (0, −r), centre at the origin
  const theta1 = theta0 + sweep;
  const rows: number[][] = [];
  for (let s = 0; s < 2 * straight + arc; s += c.speed / c.hz) {
    if (s < straight || s >= straight + arc) {
      // A fix on a tangent line: distance = (p − centre)·(cos θ, sin θ) − r.
      const entry = s < straight;
      const th = entry ? theta0 : theta1;
      const u = entry ? s - straight : s - straight - arc; // along the line from its tangent point
      const x = r * Math.cos(th) - u * Math.sin(th);
      const y = r * Math.sin(th) + u * Math.cos(th);
      const dTheta = -x * Math.sin(th) + y * Math.cos(th);
      rows.push([-Math.cos(th), -Math.sin(th), -1, dTheta, entry ? 0 : dTheta]);
    } else {
      // A fix on the arc: distance = |p − centre| − r.
      const a = theta0 + (s - straight) / r;
      rows.push([-Math.cos(a), -Math.sin(a), -1, 0, 0]);
    }
  }
  const j = new Matrix(rows);
  const covariance = inverse(j.transpose().mmul(j)).mul(c.noise ** 2);
  return Math.sqrt(covariance.get(2, 2)) / r;
}

/** The radius tolerance: 5 %, or four standard errors where the fixes cannot hold 5 %. */
const radiusTolerance = (se: number) => Math.max(0.05, 4 * se);

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
  it("are within 5 % and 5° of the driven arc at 1–10 Hz, 1–4 m/s, 2–10 cm noise", () => {
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
        const error = Math.abs(turn.radius - reference) / reference;
        expect(error).toBeLessThan(radiusTolerance(radiusStandardError(c)));
        expect(Math.abs(turn.headingChange - c.headingChange)).toBeLessThan(5);
      }),
      // A fixed seed keeps CI reproducible. GPS_TURN_RUNS and GPS_TURN_SEED run more cases and
      // other seeds (worst cases seen: docs/turn-detection.md).
      {
        numRuns: Number(process.env.GPS_TURN_RUNS ?? 150),
        seed: Number(process.env.GPS_TURN_SEED ?? 20261202),
      },
    );
  }, 600_000);

  it("asks for 5 % wherever the fixes allow it, and the bound is right where it is known", () => {
    // A half turn: the two straights alone give the radius as half their distance apart at the
    // tangent points. A least-squares line through N evenly spaced fixes is placed at its end
    // to a variance of σ²(1/N + (x − x̄)²/Sxx) = 4σ²/N (textbook simple regression), so the
    // radius is known to σ·√(2/N) from the lines; the fixes on the arc can only narrow that.
    const fixesPerStraight = 30 / (2 / 10);
    const linesOnly = (0.05 * Math.sqrt(2 / fixesPerStraight)) / 8;
    const halfTurn = radiusStandardError({
      hz: 10,
      speed: 2,
      noise: 0.05,
      radius: 8,
      headingChange: 180,
    });
    expect(halfTurn).toBeLessThanOrEqual(linesOnly * 1.0001);
    expect(halfTurn).toBeGreaterThan(linesOnly / 3);
    // The first-look case, 90° of 8 m at 10 Hz, 2 m/s, 5 cm: well inside 5 %.
    expect(
      radiusTolerance(
        radiusStandardError({ hz: 10, speed: 2, noise: 0.05, radius: 8, headingChange: 90 }),
      ),
    ).toBe(0.05);
    // Scaling: the bound is proportional to the noise (Fisher information ∝ 1/σ²).
    const at = (noise: number) =>
      radiusStandardError({ hz: 1, speed: 1, noise, radius: 5.09, headingChange: 90 });
    expect(at(0.1) / at(0.05)).toBeCloseTo(2, 6);
    // The sparse, noisy quarter turn of the header: about 3 %.
    expect(at(0.1)).toBeGreaterThan(0.025);
    expect(at(0.1)).toBeLessThan(0.035);
  });

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
