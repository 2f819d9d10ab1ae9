import {
  trapezoidOuterRad,
  trapezoidOuterSlope,
  type TrapezoidLinkage,
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

function placeContact(w: WheelSet, g: WheelPivots, i: number, delta: number): void {
  const outward = (g.py[i] ?? 0) >= 0 ? 1 : -1;
  const rs = g.scrubRadius[i] ?? 0;
  w.x[i] = (g.px[i] ?? 0) - outward * rs * Math.sin(delta);
  w.y[i] = (g.py[i] ?? 0) + outward * rs * Math.cos(delta);
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
      let delta = 0;
      let slope = 0;
      if (this.steered[i]) {
        const source = this.copyFrom[i] ?? -1;
        if (source >= 0) {
          delta = w.steer[source] as number;
          slope = w.steerSlope[source] as number;
        } else {
          const dx = (g.px[i] ?? 0) - this.xc;
          const dy = yc - (g.py[i] ?? 0);
          delta = Math.atan2(dx, dy);
          slope = (-dx / (dx * dx + dy * dy)) * dyc;
        }
      }
      w.steer[i] = delta;
      w.steerSlope[i] = slope;
      placeContact(w, g, i, delta);
    }
    return true;
  }
}

/** Front axle steered through a trapezoid linkage, inner = front-left; rear fixed. */
export class TrapezoidMap implements SteerMap {
  constructor(
    private readonly g: WheelPivots,
    private readonly linkage: TrapezoidLinkage,
  ) {}

  apply(p: number, w: WheelSet): boolean {
    if (!(p > 0 && p < Math.PI / 2)) return false;
    const outer = trapezoidOuterRad(this.linkage, p);
    if (Number.isNaN(outer)) return false;
    w.steer[0] = p;
    w.steerSlope[0] = 1;
    w.steer[1] = outer;
    w.steerSlope[1] = trapezoidOuterSlope(this.linkage, p, outer);
    w.steer[2] = 0;
    w.steerSlope[2] = 0;
    w.steer[3] = 0;
    w.steerSlope[3] = 0;
    for (let i = 0; i < 4; i++) placeContact(w, this.g, i, w.steer[i] as number);
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
    w.steer[0] = p;
    w.steer[1] = p;
    w.steerSlope[0] = 1;
    w.steerSlope[1] = 1;
    w.x[0] = this.kingX - h * s;
    w.y[0] = h * c;
    w.x[1] = this.kingX + h * s;
    w.y[1] = -h * c;
    w.steer[2] = 0;
    w.steer[3] = 0;
    w.steerSlope[2] = 0;
    w.steerSlope[3] = 0;
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
