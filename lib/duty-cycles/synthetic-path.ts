/**
 * Generated machine paths whose turns are known exactly: straights, arcs, pivots and stops,
 * sampled like a telematics logger, with optional seeded noise. Used by the turn-detection tests,
 * the ingest benchmark and the demo seed (invented data only).
 */
import type { TTurnSample } from "@/lib/scrub/segment-turns";

export type TPathLeg =
  | { kind: "straight"; distance: number; speed: number; reverse?: boolean }
  /** headingChange positive to the left (deg); radius of the reference point (m). */
  | { kind: "arc"; radius: number; headingChange: number; speed: number; reverse?: boolean }
  /** Turn on the spot at yawRate (deg/s, positive left). */
  | { kind: "pivot"; headingChange: number; yawRate: number }
  | { kind: "stop"; duration: number };

export type TPathSample = Required<
  Pick<TTurnSample, "t" | "speed" | "yawRate" | "heading" | "lat" | "lon">
> & {
  steer: number;
  /** Local east/north position (m). */
  x: number;
  y: number;
};

export type TNoise = {
  yawRate?: number;
  heading?: number;
  steer?: number;
  /** Standard deviation of the GPS position in each axis (m). */
  position?: number;
  speed?: number;
};

const DEG = Math.PI / 180;
const EARTH_RADIUS = 6_371_008.8;

/** Small, fast seeded PRNG (mulberry32), so generated logs are reproducible. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviate (Box-Muller) from a uniform source. */
export function gaussian(random: () => number): number {
  const u = Math.max(random(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
}

function legDuration(leg: TPathLeg): number {
  switch (leg.kind) {
    case "straight":
      return leg.distance / leg.speed;
    case "arc":
      return (leg.radius * Math.abs(leg.headingChange) * DEG) / leg.speed;
    case "pivot":
      return Math.abs(leg.headingChange / leg.yawRate);
    case "stop":
      return leg.duration;
  }
}

type Pose = { x: number; y: number; psi: number };

/** Pose and motion `tau` seconds into a leg; psi counter-clockwise from east (deg). */
function poseIn(leg: TPathLeg, start: Pose, tau: number) {
  const h = start.psi * DEG;
  switch (leg.kind) {
    case "straight": {
      const s = (leg.reverse ? -1 : 1) * leg.speed * tau;
      return {
        pose: { x: start.x + s * Math.cos(h), y: start.y + s * Math.sin(h), psi: start.psi },
        speed: leg.reverse ? -leg.speed : leg.speed,
        yawRate: 0,
        curvature: 0,
      };
    }
    case "arc": {
      const dir = Math.sign(leg.headingChange);
      const v = leg.reverse ? -leg.speed : leg.speed;
      // Heading turns with the signed travel: reversing with the wheels turned left turns right.
      const dPsi = (dir * v * tau) / leg.radius;
      const cx = start.x - dir * leg.radius * Math.sin(h);
      const cy = start.y + dir * leg.radius * Math.cos(h);
      const a = h + dPsi;
      return {
        pose: {
          x: cx + dir * leg.radius * Math.sin(a),
          y: cy - dir * leg.radius * Math.cos(a),
          psi: start.psi + dPsi / DEG,
        },
        speed: v,
        yawRate: (dir * v) / leg.radius / DEG,
        curvature: dir / leg.radius,
      };
    }
    case "pivot":
      return {
        pose: { ...start, psi: start.psi + leg.yawRate * tau },
        speed: 0,
        yawRate: leg.yawRate,
        curvature: 0,
      };
    case "stop":
      return { pose: start, speed: 0, yawRate: 0, curvature: 0 };
  }
}

/**
 * Samples a path at `hz`, starting at (lat0, lon0) heading `bearing0` (deg clockwise from north).
 * `wheelbase` sets the steer angle of arcs (δ = atan(L·κ)).
 */
export function samplePath({
  legs,
  hz = 10,
  lat0 = 52.1,
  lon0 = -1.3,
  bearing0 = 0,
  wheelbase = 2.8,
  noise = {},
  seed = 1,
}: {
  legs: readonly TPathLeg[];
  hz?: number;
  lat0?: number;
  lon0?: number;
  bearing0?: number;
  wheelbase?: number;
  noise?: TNoise;
  seed?: number;
}): TPathSample[] {
  const random = seededRandom(seed);
  const n = (sd: number | undefined) => (sd ? sd * gaussian(random) : 0);
  const out: TPathSample[] = [];
  const cosLat0 = Math.cos(lat0 * DEG);
  let pose: Pose = { x: 0, y: 0, psi: 90 - bearing0 };
  let legStart = 0;
  let k = 0;
  for (const leg of legs) {
    const duration = legDuration(leg);
    for (; k / hz < legStart + duration; k++) {
      const t = k / hz;
      const m = poseIn(leg, pose, t - legStart);
      const x = m.pose.x + n(noise.position);
      const y = m.pose.y + n(noise.position);
      const compass = (((90 - m.pose.psi) % 360) + 360) % 360;
      out.push({
        t,
        speed: m.speed + n(noise.speed),
        yawRate: m.yawRate + n(noise.yawRate),
        heading: (((compass + n(noise.heading)) % 360) + 360) % 360,
        steer: Math.atan(wheelbase * m.curvature) / DEG + n(noise.steer),
        x: m.pose.x,
        y: m.pose.y,
        lat: lat0 + y / EARTH_RADIUS / DEG,
        lon: lon0 + x / (EARTH_RADIUS * cosLat0) / DEG,
      });
    }
    pose = poseIn(leg, pose, duration).pose;
    legStart += duration;
  }
  return out;
}
