/**
 * Geometric least-squares fit of a straight–arc–straight path (tangent, circular arc, tangent)
 * to position fixes: the arc's centre, radius and the angles of its two tangent points are
 * chosen to minimise the sum of squared orthogonal distances from the fixes to the path.
 * Fixes before the entry tangent point are measured against the entry tangent line, those
 * after the exit tangent point against the exit line, the rest against the circle, so the two
 * straights hold the arc's ends and heading change while the arc's offset from them fixes the
 * radius. With isotropic Gaussian receiver noise of equal spread at every fix, the unweighted
 * orthogonal-distance fit is the maximum-likelihood estimate.
 *
 * Method: geometric (orthogonal distance) fitting by Levenberg–Marquardt, as for circles in
 * N. Chernov, "Circular and Linear Regression: Fitting Circles and Lines by Least Squares"
 * (CRC Press, 2010; chapter from memory: 4, geometric circle fits), extended here with the two
 * tangent lines as constraints; D. W. Marquardt, SIAM J. Appl. Math. 11 (1963) for the damping.
 * The start comes from the caller (gps-arc.ts). The 5×5 normal equations are solved with
 * ml-matrix.
 */
import { Matrix, solve } from "ml-matrix";

export type TTangentArc = {
  cx: number;
  cy: number;
  radius: number;
  /** Angle of the entry tangent point seen from the centre (rad, counter-clockwise from +x). */
  theta0: number;
  /** Angle swept along the arc (rad, > 0); the arc runs counter-clockwise when dir = 1. */
  sweep: number;
  dir: 1 | -1;
};

export type TTangentArcFit = TTangentArc & {
  /** Fixes [0, entryCount) lie on the entry straight, [n − exitCount, n) on the exit one. */
  entryCount: number;
  exitCount: number;
  /**
   * Where the tangent points fall between fixes, as fractional indices into the fixes
   * (interpolated on the along-track coordinate): to time the arc's start and end.
   */
  entryAt: number;
  exitAt: number;
  /** Root-mean-square orthogonal distance of the fixes from the fitted path (m). */
  rms: number;
};

/** Fixes in the order driven, on a local east/north plane (m). */
export type TFixes = { x: ArrayLike<number>; y: ArrayLike<number>; length: number };

const MAX_ITERATIONS = 60;

/** Splits the fixes into entry straight, arc and exit straight for the given path. */
function split(f: TFixes, p: TTangentArc) {
  const { cx, cy, radius: r, theta0, sweep, dir } = p;
  const theta1 = theta0 + dir * sweep;
  // Along-track coordinate from a tangent point, along the direction of travel there.
  const tangent = (th: number) => {
    const c = Math.cos(th);
    const s = Math.sin(th);
    return { x: cx + r * c, y: cy + r * s, ux: -dir * s, uy: dir * c };
  };
  const t0 = tangent(theta0);
  const t1 = tangent(theta1);
  const along = (i: number, t: typeof t0) => (f.x[i]! - t.x) * t.ux + (f.y[i]! - t.y) * t.uy;
  const crossing = (i: number, t: typeof t0) => {
    if (i <= 0) return 0;
    if (i >= f.length) return f.length - 1;
    const u = along(i - 1, t);
    const v = along(i, t);
    return v > u ? i - 1 + Math.min(1, Math.max(0, -u / (v - u))) : i - 0.5;
  };
  let entry = 0;
  while (entry < f.length && along(entry, t0) < 0) entry++;
  let exit = 0;
  while (exit < f.length - entry && along(f.length - 1 - exit, t1) > 0) exit++;
  return {
    entry,
    exit,
    entryAt: () => crossing(entry, t0),
    exitAt: () => crossing(f.length - exit, t1),
  };
}

/** Residuals (and, when `jac` is given, their Jacobian rows) of every fix. */
function residuals(f: TFixes, p: TTangentArc, res: Float64Array, jac?: Float64Array): number {
  const { cx, cy, radius: r, theta0, sweep, dir } = p;
  const theta1 = theta0 + dir * sweep;
  const { entry, exit } = split(f, p);
  const c0 = Math.cos(theta0);
  const s0 = Math.sin(theta0);
  const c1 = Math.cos(theta1);
  const s1 = Math.sin(theta1);
  let sse = 0;
  for (let i = 0; i < f.length; i++) {
    const dx = f.x[i]! - cx;
    const dy = f.y[i]! - cy;
    let e: number;
    const k = i * 5;
    if (i < entry || i >= f.length - exit) {
      // Distance from a tangent line = projection on the radius to the tangent point − R.
      const first = i < entry;
      const c = first ? c0 : c1;
      const s = first ? s0 : s1;
      e = dx * c + dy * s - r;
      if (jac) {
        const dTheta = -dx * s + dy * c;
        jac[k] = -c;
        jac[k + 1] = -s;
        jac[k + 2] = -1;
        jac[k + 3] = dTheta;
        jac[k + 4] = first ? 0 : dir * dTheta;
      }
    } else {
      const rho = Math.hypot(dx, dy);
      e = rho - r;
      if (jac) {
        jac[k] = rho > 0 ? -dx / rho : 0;
        jac[k + 1] = rho > 0 ? -dy / rho : 0;
        jac[k + 2] = -1;
        jac[k + 3] = 0;
        jac[k + 4] = 0;
      }
    }
    res[i] = e;
    sse += e * e;
  }
  return sse;
}

function withStep(p: TTangentArc, d: readonly number[]): TTangentArc {
  return {
    cx: p.cx + d[0]!,
    cy: p.cy + d[1]!,
    radius: p.radius + d[2]!,
    theta0: p.theta0 + d[3]!,
    sweep: p.sweep + d[4]!,
    dir: p.dir,
  };
}

/**
 * Refines `start` to the least-squares straight–arc–straight path through the fixes; undefined
 * when at the optimum fewer than `minEdge` fixes lie on either straight or fewer than `minArc`
 * on the arc (then the data cannot place the arc's ends), or when the fit breaks down.
 */
export function fitTangentArc(
  fixes: TFixes,
  start: TTangentArc,
  { minEdge = 2, minArc = 3 }: { minEdge?: number; minArc?: number } = {},
): TTangentArcFit | undefined {
  const n = fixes.length;
  if (n < 2 * minEdge + minArc || !(start.radius > 0) || !(start.sweep > 0)) return undefined;
  // Current and trial residuals and Jacobians, swapped when a trial step is taken.
  let res = new Float64Array(n);
  let jac = new Float64Array(n * 5);
  let resQ = new Float64Array(n);
  let jacQ = new Float64Array(n * 5);
  let p = start;
  let sse = residuals(fixes, p, res, jac);
  let lambda = 1e-3;
  const scale = Math.max(start.radius, 1);
  let converged = false;
  for (let iter = 0; iter < MAX_ITERATIONS && !converged; iter++) {
    // Normal equations JᵀJ d = −Jᵀr, damped on the diagonal (Marquardt's scaling). The sums
    // are plain locals: this loop is the fit's hot spot.
    let a00 = 0,
      a01 = 0,
      a02 = 0,
      a03 = 0,
      a04 = 0,
      a11 = 0,
      a12 = 0,
      a13 = 0,
      a14 = 0;
    let a22 = 0,
      a23 = 0,
      a24 = 0,
      a33 = 0,
      a34 = 0,
      a44 = 0;
    let g0 = 0,
      g1 = 0,
      g2 = 0,
      g3 = 0,
      g4 = 0;
    for (let i = 0; i < n; i++) {
      const k = i * 5;
      const j0 = jac[k]!;
      const j1 = jac[k + 1]!;
      const j2 = jac[k + 2]!;
      const j3 = jac[k + 3]!;
      const j4 = jac[k + 4]!;
      const e = res[i]!;
      a00 += j0 * j0;
      a01 += j0 * j1;
      a02 += j0 * j2;
      a03 += j0 * j3;
      a04 += j0 * j4;
      a11 += j1 * j1;
      a12 += j1 * j2;
      a13 += j1 * j3;
      a14 += j1 * j4;
      a22 += j2 * j2;
      a23 += j2 * j3;
      a24 += j2 * j4;
      a33 += j3 * j3;
      a34 += j3 * j4;
      a44 += j4 * j4;
      g0 += j0 * e;
      g1 += j1 * e;
      g2 += j2 * e;
      g3 += j3 * e;
      g4 += j4 * e;
    }
    const jtj = [
      [a00, a01, a02, a03, a04],
      [a01, a11, a12, a13, a14],
      [a02, a12, a22, a23, a24],
      [a03, a13, a23, a33, a34],
      [a04, a14, a24, a34, a44],
    ];
    const minusJtr = Matrix.columnVector([-g0, -g1, -g2, -g3, -g4]);
    let improved = false;
    for (let attempt = 0; attempt < 10 && !improved; attempt++) {
      // A parameter the fixes do not touch (no fix on a straight) must not make it singular.
      const a = new Matrix(
        jtj.map((row, r) => row.map((v, c) => (r === c ? v * (1 + lambda) + 1e-12 : v))),
      );
      let d: number[];
      try {
        d = solve(a, minusJtr).to1DArray();
      } catch {
        return undefined; // singular even when damped: the fixes cannot hold this path
      }
      if (!d.every(Number.isFinite)) return undefined;
      const q = withStep(p, d);
      if (!(q.radius > 0) || !(q.sweep > 0)) {
        lambda *= 10;
        continue;
      }
      const sseQ = residuals(fixes, q, resQ, jacQ);
      if (sseQ <= sse) {
        const small =
          Math.hypot(d[0]!, d[1]!, d[2]!) < 1e-7 * scale && Math.hypot(d[3]!, d[4]!) < 1e-9;
        p = q;
        sse = sseQ;
        [res, resQ] = [resQ, res];
        [jac, jacQ] = [jacQ, jac];
        lambda = Math.max(lambda / 10, 1e-9);
        improved = true;
        converged = small || sse === 0;
      } else lambda *= 10;
    }
    if (!improved) break;
  }
  const { entry, exit, entryAt, exitAt } = split(fixes, p);
  if (entry < minEdge || exit < minEdge || n - entry - exit < minArc) return undefined;
  if (!Number.isFinite(sse)) return undefined;
  return {
    ...p,
    entryCount: entry,
    exitCount: exit,
    entryAt: entryAt(),
    exitAt: exitAt(),
    rms: Math.sqrt(sse / n),
  };
}
