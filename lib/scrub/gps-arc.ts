/**
 * A GPS turn's arc from its fixes: picks the stretch of unbroken driving that holds the arc,
 * starts the straight–arc–straight fit of fit-tangent-arc.ts from a guess of the arc (the
 * detector's core, or the heading fit) and turns its result into the turn's measures. Method: docs/turn-detection.md, step 5.
 */
import { fitTangentArc } from "./fit-tangent-arc";

const DEG = Math.PI / 180;

/** GPS fixes: east, north (m), distance (m), time (s), stretch of driving, in order. */
export type TFixPoints = { x: number[]; y: number[]; s: number[]; t: number[]; run: number[] };

/** Largest disagreement with its start at which the fit to the positions is still trusted. */
const MAX_SWEEP_CHANGE = 20; // deg
const MAX_RADIUS_RATIO = 1.4;

/**
 * The arc fitted to the GPS fixes themselves (fit-tangent-arc.ts), started from a guess: arc
 * from distance a to b, heading (deg, left positive) ψ0 before it and ψ1 after. The guess's
 * ends place the tangent points on the fixes, its headings the tangent lines. Undefined when
 * the fixes cannot carry the fit (too few on a straight or the arc, a stop or a change of
 * direction inside it) or it strays far from the guess; the caller then falls back.
 */
export function fitArcToFixes(
  f: TFixPoints,
  ramp: { a: number; b: number; psi0: number; psi1: number },
  reverse: boolean,
) {
  const n = f.x.length;
  if (n < 7) return undefined;
  // Only the stretch of unbroken driving that holds the middle of the arc.
  const midS = (ramp.a + ramp.b) / 2;
  let m = 0;
  while (m < n - 1 && f.s[m]! < midS) m++;
  const run = f.run[m]!;
  let lo = m;
  while (lo > 0 && f.run[lo - 1] === run) lo--;
  let hi = m;
  while (hi < n - 1 && f.run[hi + 1] === run) hi++;
  const xs = f.x.slice(lo, hi + 1);
  const ys = f.y.slice(lo, hi + 1);
  const ss = f.s.slice(lo, hi + 1);
  const ts = f.t.slice(lo, hi + 1);
  const dPsi = ramp.psi1 - ramp.psi0;
  const dir = dPsi > 0 ? 1 : -1;
  const sweep = Math.abs(dPsi) * DEG;
  const radius = (ramp.b - ramp.a) / sweep;
  // Course of travel at the entry (the machine points the other way in reverse); the tangent
  // point lies a quarter turn from it, seen from the centre.
  const theta0 = (ramp.psi0 + (reverse ? 180 : 0) - dir * 90) * DEG;
  const tx = interpolate(ss, xs, ramp.a);
  const ty = interpolate(ss, ys, ramp.a);
  const arc = fitTangentArc(
    { x: xs, y: ys, length: xs.length },
    {
      cx: tx - radius * Math.cos(theta0),
      cy: ty - radius * Math.sin(theta0),
      radius,
      theta0,
      sweep,
      dir,
    },
  );
  if (!arc) return undefined;
  const ratio = arc.radius / radius;
  if (
    Math.abs(arc.sweep - sweep) / DEG > MAX_SWEEP_CHANGE ||
    ratio > MAX_RADIUS_RATIO ||
    ratio < 1 / MAX_RADIUS_RATIO
  ) {
    return undefined;
  }
  const at = (u: number) => {
    const i = Math.min(Math.floor(u), ts.length - 2);
    return ts[i]! + (ts[i + 1]! - ts[i]!) * (u - i);
  };
  return {
    start: at(arc.entryAt),
    end: at(arc.exitAt),
    headingChange: arc.sweep / DEG,
    distance: arc.radius * arc.sweep,
  };
}

/** y at x on the polyline (xs ascending, at least one point), straight on past either end. */
export function interpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  const n = xs.length;
  if (n === 1) return ys[0]!;
  let i = 1;
  while (i < n - 1 && xs[i]! < x) i++;
  const x0 = xs[i - 1]!;
  const x1 = xs[i]!;
  return x1 > x0 ? ys[i - 1]! + ((ys[i]! - ys[i - 1]!) * (x - x0)) / (x1 - x0) : ys[i]!;
}
