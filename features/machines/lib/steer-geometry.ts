/**
 * Kinematic plan view of a machine for the live geometry view: where each wheel is, where it
 * points, and where the wheels' spin axes cross (the turning centres) at a steer input.
 * Left turns (centre at +y), body frame x forward, y left, SI units, angles in degrees.
 * Formulas: Ackermann condition, SAE J695 turning-diameter form TD = 2(L/sin δo + r_s), turntable and
 * articulated relations as in docs/engine.md; the engine primitives do the linkage and radii.
 * This is geometry only: the engine finds the real turning centre from tyre forces when the
 * wheels do not share one.
 */
import {
  angleErrorCurve,
  articulatedRadii,
  idealSteerAngles,
  linkageOuterAngle,
  type TMachine,
  type TPosition,
  type TSteering,
} from "@/lib/scrub";

const RAD = Math.PI / 180;
const tanD = (d: number) => Math.tan(d * RAD);
const atanD = (v: number) => Math.atan(v) / RAD;

export type TPlanWheel = { position: TPosition; x: number; y: number; heading: number };
export type TPlanCentre = { x: number; y: number; label: string };
export type TPlanView = {
  wheels: TPlanWheel[];
  /** Where spin axes cross; one point when every wheel agrees, several when they do not. */
  centres: TPlanCentre[];
  /** Hinge of an articulated frame, king bolt of a turntable. */
  pivot: { x: number; y: number } | null;
  /** Diameter of the outer tyre's contact path (m), ISO 7457 / SAE J695 sense; null when undefined (straight, crab). */
  turningDiameter: number | null;
  /** Direction of travel in a crab traverse (deg), else null. */
  crabHeading: number | null;
};

/** The largest steer input of the layout (deg), or the radius range for a skid steer (m). */
export function steerInputRange(steering: TSteering): {
  max: number;
  unit: "deg" | "m";
  label: string;
} {
  switch (steering.layout) {
    case "articulated":
      return { max: steering.maxArticulation, unit: "deg", label: "Articulation angle" };
    case "skid":
      return { max: 10, unit: "m", label: "Turn radius of the machine centre" };
    case "turntable":
      return { max: steering.maxLock, unit: "deg", label: "Axle swing angle" };
    case "crab":
      return { max: steering.maxLock, unit: "deg", label: "Crab angle" };
    default:
      return { max: steering.maxLock, unit: "deg", label: "Inside wheel angle" };
  }
}

/** Outer road-wheel angle of a front-steer pair for an inner angle; NaN when the linkage cannot reach. */
export function outerAngle(
  steering: TSteering,
  wheelbase: number,
  pivotTrack: number,
  inner: number,
): number {
  if (inner <= 0) return 0;
  switch (steering.layout) {
    case "trapezoid":
      try {
        return linkageOuterAngle({
          pivotTrack,
          armLength: steering.armLength,
          armAngle: steering.armAngle,
          tieRod: steering.tieRod,
          inner,
        });
      } catch {
        return Number.NaN;
      }
    case "parallel":
      return inner;
    case "rear":
    case "four-wheel":
    case "crab":
      if (steering.wheelAngles === "parallel") return inner;
      return idealOuter(wheelbase, pivotTrack, inner);
    default:
      return idealOuter(wheelbase, pivotTrack, inner);
  }
}

/** Ackermann outer angle for an inner angle: cot δo = cot δi + T_k/L. */
export function idealOuter(wheelbase: number, pivotTrack: number, inner: number): number {
  if (inner <= 0) return 0;
  const radius = wheelbase / tanD(inner) + pivotTrack / 2;
  return idealSteerAngles({ wheelbase, pivotTrack, radius }).outer;
}

const pivotTrackOf = (axle: TMachine["axles"]["front"]) => axle.pivotTrack ?? axle.track;

function axisCrossing(x0: number, y0: number, heading: number, atX: number): number {
  // Spin axis of a wheel at (x0, y0) pointing `heading`: direction (−sin h, cos h).
  return y0 + (x0 - atX) / tanD(heading);
}

/** Plan view at a steer input (deg; skid steer: radius of the machine centre in m). */
export function planView(machine: TMachine, input: number): TPlanView {
  const { front, rear } = machine.axles;
  const L = machine.wheelbase;
  const s = machine.steering;
  const tf = front.track / 2;
  const tr = rear.track / 2;
  const straight = input <= 1e-6 && s.layout !== "skid";
  const fixedRear = (heading = 0): TPlanWheel[] => [
    { position: "rear-left", x: 0, y: tr, heading },
    { position: "rear-right", x: 0, y: -tr, heading },
  ];

  switch (s.layout) {
    case "ideal":
    case "trapezoid":
    case "parallel": {
      const kf = pivotTrackOf(front) / 2;
      const outer = straight ? 0 : outerAngle(s, L, kf * 2, input);
      const wheels: TPlanWheel[] = [
        { position: "front-left", x: L, y: tf, heading: input },
        { position: "front-right", x: L, y: -tf, heading: outer },
        ...fixedRear(),
      ];
      if (straight || Number.isNaN(outer))
        return { wheels, centres: [], pivot: null, turningDiameter: null, crabHeading: null };
      const ci = axisCrossing(L, kf, input, 0);
      const co = axisCrossing(L, -kf, outer, 0);
      const centres =
        Math.abs(ci - co) < 1e-3
          ? [{ x: 0, y: ci, label: "Turning centre" }]
          : [
              { x: 0, y: ci, label: "Inside wheel's centre" },
              { x: 0, y: co, label: "Outside wheel's centre" },
            ];
      const scrubRadius = tf - kf;
      return {
        wheels,
        centres,
        pivot: null,
        turningDiameter: 2 * (L / Math.sin(outer * RAD) + scrubRadius),
        crabHeading: null,
      };
    }
    case "rear": {
      // Front axle fixed at the origin, rear axle steered at x = −L.
      const kr = pivotTrackOf(rear) / 2;
      const outer = straight ? 0 : outerAngle(s, L, kr * 2, input);
      const wheels: TPlanWheel[] = [
        { position: "front-left", x: 0, y: tf, heading: 0 },
        { position: "front-right", x: 0, y: -tf, heading: 0 },
        { position: "rear-left", x: -L, y: tr, heading: -input },
        { position: "rear-right", x: -L, y: -tr, heading: -outer },
      ];
      if (straight)
        return { wheels, centres: [], pivot: null, turningDiameter: null, crabHeading: null };
      const ci = axisCrossing(-L, kr, -input, 0);
      const co = axisCrossing(-L, -kr, -outer, 0);
      const centres =
        Math.abs(ci - co) < 1e-3
          ? [{ x: 0, y: ci, label: "Turning centre" }]
          : [
              { x: 0, y: ci, label: "Inside wheel's centre" },
              { x: 0, y: co, label: "Outside wheel's centre" },
            ];
      return {
        wheels,
        centres,
        pivot: null,
        turningDiameter: 2 * (L / Math.sin(outer * RAD) + (tr - kr)),
        crabHeading: null,
      };
    }
    case "four-wheel": {
      const k = s.rearRatio ?? 1;
      const half = L / 2;
      const kf = pivotTrackOf(front) / 2;
      const kr = pivotTrackOf(rear) / 2;
      // Single-track centre lies where tan δr / tan δf = k: x_c = (L/2)(k − 1)/(k + 1).
      const xc = (half * (k - 1)) / (k + 1);
      let headings: Record<TPosition, number>;
      let centre = { x: xc, y: Infinity };
      if (straight) {
        headings = { "front-left": 0, "front-right": 0, "rear-left": 0, "rear-right": 0 };
      } else if (s.wheelAngles === "parallel") {
        const rearAngle = -atanD(k * tanD(input));
        headings = {
          "front-left": input,
          "front-right": input,
          "rear-left": rearAngle,
          "rear-right": rearAngle,
        };
        centre = { x: xc, y: (half - xc) / tanD(input) };
      } else {
        const R = (half - xc) / tanD(input) + kf;
        const aim = (x: number, y: number) => Math.atan2(x - xc, R - y) / RAD;
        headings = {
          "front-left": aim(half, kf),
          "front-right": aim(half, -kf),
          "rear-left": aim(-half, kr),
          "rear-right": aim(-half, -kr),
        };
        centre = { x: xc, y: R };
      }
      const wheels: TPlanWheel[] = [
        { position: "front-left", x: half, y: tf, heading: headings["front-left"] },
        { position: "front-right", x: half, y: -tf, heading: headings["front-right"] },
        { position: "rear-left", x: -half, y: tr, heading: headings["rear-left"] },
        { position: "rear-right", x: -half, y: -tr, heading: headings["rear-right"] },
      ];
      if (straight)
        return { wheels, centres: [], pivot: null, turningDiameter: null, crabHeading: null };
      const label = s.wheelAngles === "parallel" ? "Single-track centre" : "Turning centre";
      return {
        wheels,
        centres: [{ ...centre, label }],
        pivot: null,
        turningDiameter:
          2 * Math.max(...wheels.map((w) => Math.hypot(w.x - centre.x, w.y - centre.y))),
        crabHeading: null,
      };
    }
    case "crab": {
      const half = L / 2;
      const wheels: TPlanWheel[] = [
        { position: "front-left", x: half, y: tf, heading: input },
        { position: "front-right", x: half, y: -tf, heading: input },
        { position: "rear-left", x: -half, y: tr, heading: input },
        { position: "rear-right", x: -half, y: -tr, heading: input },
      ];
      return { wheels, centres: [], pivot: null, turningDiameter: null, crabHeading: input };
    }
    case "turntable": {
      const swing = input * RAD;
      const wheels: TPlanWheel[] = [
        {
          position: "front-left",
          x: L - tf * Math.sin(swing),
          y: tf * Math.cos(swing),
          heading: input,
        },
        {
          position: "front-right",
          x: L + tf * Math.sin(swing),
          y: -tf * Math.cos(swing),
          heading: input,
        },
        ...fixedRear(),
      ];
      if (straight)
        return {
          wheels,
          centres: [],
          pivot: { x: L, y: 0 },
          turningDiameter: null,
          crabHeading: null,
        };
      const cy = L / tanD(input);
      const outer = wheels[1]!;
      return {
        wheels,
        centres: [{ x: 0, y: cy, label: "Turning centre" }],
        pivot: { x: L, y: 0 },
        turningDiameter: 2 * Math.hypot(outer.x, outer.y - cy),
        crabHeading: null,
      };
    }
    case "articulated": {
      const { frontLength: lf, rearLength: lr } = s;
      const g = input * RAD;
      const fx = lr + lf * Math.cos(g);
      const fy = lf * Math.sin(g);
      const wheels: TPlanWheel[] = [
        {
          position: "front-left",
          x: fx - tf * Math.sin(g),
          y: fy + tf * Math.cos(g),
          heading: input,
        },
        {
          position: "front-right",
          x: fx + tf * Math.sin(g),
          y: fy - tf * Math.cos(g),
          heading: input,
        },
        ...fixedRear(),
      ];
      if (straight)
        return {
          wheels,
          centres: [],
          pivot: { x: lr, y: 0 },
          turningDiameter: null,
          crabHeading: null,
        };
      const cy = articulatedRadii({ frontLength: lf, rearLength: lr, articulation: input }).rear;
      return {
        wheels,
        centres: [{ x: 0, y: cy, label: "Turning centre" }],
        pivot: { x: lr, y: 0 },
        turningDiameter: 2 * Math.max(...wheels.map((w) => Math.hypot(w.x, w.y - cy))),
        crabHeading: null,
      };
    }
    case "skid": {
      const half = L / 2;
      const wheels: TPlanWheel[] = [
        { position: "front-left", x: half, y: tf, heading: 0 },
        { position: "front-right", x: half, y: -tf, heading: 0 },
        { position: "rear-left", x: -half, y: tr, heading: 0 },
        { position: "rear-right", x: -half, y: -tr, heading: 0 },
      ];
      return {
        wheels,
        centres: [{ x: 0, y: input, label: input === 0 ? "Pivot turn centre" : "Turning centre" }],
        pivot: null,
        turningDiameter: 2 * Math.max(...wheels.map((w) => Math.hypot(w.x, w.y - input))),
        crabHeading: null,
      };
    }
  }
}

export type TLockPoint = { inner: number; outer: number | null; ideal: number };
export type TLockCurve = {
  points: TLockPoint[];
  /** At full lock, the engine's toe-out-difference definition; null when the linkage cannot reach full lock. */
  percentAckermannAtFullLock: number | null;
  fullLock: number;
};

const PAIRED_LAYOUTS = new Set(["ideal", "trapezoid", "parallel", "rear", "four-wheel"]);

/**
 * Outer against inner road-wheel angle across the lock range with the Ackermann ideal, from the
 * engine's angle-error curve, for layouts with an inner/outer wheel pair on a steered axle; null
 * for the others (turntable and articulated share one spin axis, crab and skid do not turn so).
 */
export function lockCurve(machine: TMachine, steps = 40): TLockCurve | null {
  const s = machine.steering;
  if (!PAIRED_LAYOUTS.has(s.layout) || !("maxLock" in s)) return null;
  const curve = angleErrorCurve({ machine, steps });
  const points: TLockPoint[] = [
    { inner: 0, outer: 0, ideal: 0 },
    ...curve.map((p) => ({ inner: p.inner, outer: p.outer, ideal: p.idealOuter })),
  ];
  const last = curve[curve.length - 1];
  const reachesFullLock = !!last && Math.abs(last.inner - s.maxLock) < 1e-9;
  return {
    points,
    percentAckermannAtFullLock: reachesFullLock ? last.percentAckermann : null,
    fullLock: s.maxLock,
  };
}
