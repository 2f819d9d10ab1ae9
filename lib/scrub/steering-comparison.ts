import { toDegrees, toRadians } from "./angles";
import { prepareTrapezoid, trapezoidOuterRad } from "./linkage-outer-angle";
import { ZMachine, type TMachineInput, type TSteeringLayout } from "./schemas";

/**
 * Percent Ackermann. Definitions vary between authors (PHYSICS.md §1.2 [M: Milliken]); the
 * engine's default is the toe-out-difference ratio
 *   %A = 100·(δ_i − δ_o,actual)/(δ_i − δ_o,ideal)
 * (100 % = true Ackermann, 0 % = parallel, < 0 = anti-Ackermann). "cotangent" gives
 *   %A = 100·L·(cot δ_o − cot δ_i)/T_k = 100·L/L_eff.
 */
export const PERCENT_ACKERMANN_DEFINITION =
  "toe-out difference ratio: 100·(inner − outer) / (inner − ideal outer), ideal outer from cot δo − cot δi = pivotTrack / wheelbase";

export function percentAckermann({
  inner,
  outer,
  wheelbase,
  pivotTrack,
  definition = "toe-out",
}: {
  /** Inner-wheel angle (deg). */
  inner: number;
  /** Actual outer-wheel angle (deg). */
  outer: number;
  wheelbase: number;
  pivotTrack: number;
  definition?: "toe-out" | "cotangent";
}): number {
  const di = toRadians(inner);
  const doActual = toRadians(outer);
  if (!(di > 0)) throw new Error("percentAckermann: inner angle must be above 0°.");
  if (definition === "cotangent") {
    return (100 * wheelbase * (1 / Math.tan(doActual) - 1 / Math.tan(di))) / pivotTrack;
  }
  const ideal = Math.atan2(Math.sin(di), Math.cos(di) + (pivotTrack / wheelbase) * Math.sin(di));
  return (100 * (di - doActual)) / (di - ideal);
}

/**
 * Turning diameter to the outer tyre contact centre for correct (Ackermann) geometry, the form
 * quoted for SAE J695: TD = 2·(WB / sin δ_o + OS), OS = scrub radius (pivot to contact centre).
 */
export function turningDiameter({
  wheelbase,
  outerAngle,
  scrubRadius,
}: {
  wheelbase: number;
  /** Outer-wheel angle (deg). */
  outerAngle: number;
  /** Offset of the contact centre outboard of the pivot (m). */
  scrubRadius: number;
}): number {
  return 2 * (wheelbase / Math.sin(toRadians(outerAngle)) + scrubRadius);
}

export interface TAngleErrorPoint {
  /** Inner-wheel angle (deg). */
  inner: number;
  /** Outer-wheel angle of the layout (deg). */
  outer: number;
  /** Outer angle that meets the Ackermann condition (deg). */
  idealOuter: number;
  /** outer − idealOuter (deg); > 0 = outer wheel steered too far (toward parallel). */
  error: number;
  /** Percent Ackermann, toe-out-difference definition. */
  percentAckermann: number;
}

/**
 * Outer-wheel angle error of a steered axle against the Ackermann condition over the full lock
 * range (PHYSICS.md §1.2). Works for front-steer layouts (ideal, parallel, trapezoid) and for
 * the steered axle of rear steer (wheelbase as lever) and four-wheel steer (distance from the
 * axle to the turning-centre line as lever). Single-spin-axis layouts (turntable, articulated)
 * have no error by construction and return zeros.
 */
export function angleErrorCurve({
  machine,
  layout,
  steps = 45,
}: {
  machine: TMachineInput;
  /** Steering mode; the machine's default when omitted. */
  layout?: TSteeringLayout;
  steps?: number;
}): TAngleErrorPoint[] {
  const m = ZMachine.parse(machine);
  const modes = [m.steering, ...m.otherSteeringModes];
  const s = layout ? modes.find((x) => x.layout === layout) : m.steering;
  if (!s) throw new Error(`angleErrorCurve: the machine has no ${layout} steering mode.`);
  if (s.layout === "skid" || s.layout === "crab") {
    throw new Error(`angleErrorCurve: ${s.layout} steering has no inner/outer wheel pair.`);
  }
  const maxLock = s.layout === "articulated" ? s.maxArticulation : s.maxLock;
  let lever = m.wheelbase;
  let pivotTrack = (m.axles.front.pivotTrack ?? m.axles.front.track) as number;
  if (s.layout === "rear") pivotTrack = m.axles.rear.pivotTrack ?? m.axles.rear.track;
  if (s.layout === "four-wheel") {
    const xf = m.wheelbase / 2;
    const xc = ((s.rearRatio - 1) * m.wheelbase) / (2 * (1 + s.rearRatio));
    lever = xf - xc;
  }
  const k = pivotTrack / lever;
  const linkage =
    s.layout === "trapezoid"
      ? prepareTrapezoid(pivotTrack, s.armLength, toRadians(s.armAngle), s.tieRod)
      : null;
  const points: TAngleErrorPoint[] = [];
  for (let j = 1; j <= steps; j++) {
    const inner = (maxLock * j) / steps;
    const di = toRadians(inner);
    const ideal = toDegrees(Math.atan2(Math.sin(di), Math.cos(di) + k * Math.sin(di)));
    let outer = ideal;
    if (s.layout === "parallel") outer = inner;
    if ((s.layout === "rear" || s.layout === "four-wheel") && s.wheelAngles === "parallel") {
      outer = inner;
    }
    if (linkage) {
      const o = trapezoidOuterRad(linkage, di);
      // Beyond the linkage's reach the curve ends (the machine cannot steer further).
      if (Number.isNaN(o)) break;
      outer = toDegrees(o);
    }
    const single = s.layout === "turntable" || s.layout === "articulated";
    if (single) outer = inner;
    const idealOuter = single ? inner : ideal;
    points.push({
      inner,
      outer,
      idealOuter,
      error: outer - idealOuter,
      percentAckermann: single ? 100 : (100 * (inner - outer)) / (inner - idealOuter),
    });
  }
  return points;
}
