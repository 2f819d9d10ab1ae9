import {
  solveTrapezoid,
  type TrapezoidLinkage,
  type TrapezoidSolution,
} from "./linkage-outer-angle";
import type { SteerMap } from "./turn-solver";
import type { WheelSet } from "./wheel-set";

/**
 * Steering maps for a LEFT turn: input p (rad) = angle of the reference inner wheel (or axle /
 * crab angle). Each map writes steer angles, dδ/dp and tyre contact positions. Wheel order is
 * front-left, front-right, rear-left, rear-right. Contact centres sit on the spin axis, the scrub
 * radius r_s outboard of the steering pivot: contact = pivot + r_s·(−sin δ, cos δ) on the left,
 * pivot + r_s·(sin δ, −cos δ) on the right.
 */
export interface WheelPivots {
  /** Pivot (or contact, for unsteered wheels) positions (m). */
  px: readonly number[];
  py: readonly number[];
  /** Scrub radius r_s (m), positive outboard. */
  scrubRadius: readonly number[];
}

/** Writes steer δ (with its sine and cosine) and the contact position of wheel i. */
function placeWheel(
  w: WheelSet,
  g: WheelPivots,
  i: number,
  delta: number,
  sin: number,
  cos: number,
  slope: number,
): void {
  w.steer[i] = delta;
  w.sinSteer[i] = sin;
  w.cosSteer[i] = cos;
  w.steerSlope[i] = slope;
  const outward = (g.py[i] ?? 0) >= 0 ? 1 : -1;
  const rs = g.scrubRadius[i] ?? 0;
  w.x[i] = (g.px[i] ?? 0) - outward * rs * sin;
  w.y[i] = (g.py[i] ?? 0) + outward * rs * cos;
}

/**
 * Every steered wheel's spin axis passes through a turning centre on the line x = xc
 * (Ackermann condition generalised, PHYSICS.md §3 [C]): tan δ_j = (x_j − x_c)/(y_c − y_j).
 * `copyFrom[j] ≥ 0` makes wheel j copy another wheel's angle (parallel rule on that axle).
 */
export class IcrLineMap implements SteerMap {
  constructor(
    private readonly g: WheelPivots,
    private readonly xc: number,
    private readonly reference: number,
    private readonly steered: readonly boolean[],
    private readonly copyFrom: readonly number[],
  ) {}

  apply(p: number, w: WheelSet): boolean {
    if (!(p > 0 && p < Math.PI / 2)) return false;
    const g = this.g;
    const refDx = Math.abs((g.px[this.reference] ?? 0) - this.xc);
    const sp = Math.sin(p);
    const yc = (g.py[this.reference] ?? 0) + (refDx * Math.cos(p)) / sp;
    const dyc = -refDx / (sp * sp);
    for (let i = 0; i < w.count; i++) {
      if (!this.steered[i]) {
        placeWheel(w, g, i, 0, 0, 1, 0);
        continue;
      }
      const source = this.copyFrom[i] ?? -1;
      if (source >= 0) {
        placeWheel(
          w,
          g,
          i,
          w.steer[source] as number,
          w.sinSteer[source] as number,
          w.cosSteer[source] as number,
          w.steerSlope[source] as number,
        );
        continue;
      }
      const dx = (g.px[i] ?? 0) - this.xc;
      const dy = yc - (g.py[i] ?? 0);
      const rho2 = dx * dx + dy * dy;
      const rho = Math.sqrt(rho2);
      placeWheel(w, g, i, Math.atan2(dx, dy), dx / rho, dy / rho, (-dx / rho2) * dyc);
    }
    return true;
  }
}

/** Front axle steered through a trapezoid linkage, inner = front-left; rear fixed. */
export class TrapezoidMap implements SteerMap {
  private readonly outer: TrapezoidSolution = { outer: 0, sinOuter: 0, cosOuter: 1, slope: 1 };

  constructor(
    private readonly g: WheelPivots,
    private readonly linkage: TrapezoidLinkage,
  ) {}

  apply(p: number, w: WheelSet): boolean {
    if (!(p > 0 && p < Math.PI / 2)) return false;
    const sin = Math.sin(p);
    const cos = Math.cos(p);
    const o = this.outer;
    if (!solveTrapezoid(this.linkage, p, sin, cos, o) || !(o.slope > 0)) return false;
    placeWheel(w, this.g, 0, p, sin, cos, 1);
    placeWheel(w, this.g, 1, o.outer, o.sinOuter, o.cosOuter, o.slope);
    placeWheel(w, this.g, 2, 0, 0, 1, 0);
    placeWheel(w, this.g, 3, 0, 0, 1, 0);
    return true;
  }
}

/** Whole front axle swings about a king bolt at (kingX, 0); both wheels share one spin axis. */
export class TurntableMap implements SteerMap {
  constructor(
    private readonly kingX: number,
    private readonly frontTrack: number,
    private readonly rearTrack: number,
  ) {}

  apply(p: number, w: WheelSet): boolean {
    if (!(p > 0 && p < Math.PI / 2)) return false;
    const h = this.frontTrack / 2;
    const s = Math.sin(p);
    const c = Math.cos(p);
    for (let i = 0; i < 2; i++) {
      w.steer[i] = p;
      w.sinSteer[i] = s;
      w.cosSteer[i] = c;
      w.steerSlope[i] = 1;
    }
    w.x[0] = this.kingX - h * s;
    w.y[0] = h * c;
    w.x[1] = this.kingX + h * s;
    w.y[1] = -h * c;
    for (let i = 2; i < 4; i++) {
      w.steer[i] = 0;
      w.sinSteer[i] = 0;
      w.cosSteer[i] = 1;
      w.steerSlope[i] = 0;
    }
    w.x[2] = 0;
    w.x[3] = 0;
    w.y[2] = this.rearTrack / 2;
    w.y[3] = -this.rearTrack / 2;
    return true;
  }
}

/** Ackermann outer angle for inner angle p at a given pivot-track/lever ratio k = T_k/L. */
export function ackermannOuterRad(p: number, k: number): number {
  return Math.atan2(Math.sin(p), Math.cos(p) + k * Math.sin(p));
}
