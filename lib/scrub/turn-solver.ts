import type { WheelSet } from "./wheel-set";

/**
 * Quasi-static turn solvers (PHYSICS.md §5.1–5.2 [C]). Body twist at the origin: forward speed
 * u, lateral speed v, yaw rate r. For wheel i at (x, y) steered δ:
 *   V_x = u − r y, V_y = v + r x;  N = V_x sin δ − V_y cos δ;  D = V_x cos δ + V_y sin δ
 *   σ = tan α = N/|D| (α > 0: wheel points left of its path; force acts left, opposing the slide)
 * Balance: Σ F cos δ = m u r (lateral),  Σ F (x cos δ + y sin δ) = m u r x_cg (yaw about O).
 * No allocation inside the loops: residuals and Jacobian live in module scratch variables.
 */

/** Writes steer angles, dδ/dp and contact positions for steering input p (rad). */
export interface SteerMap {
  apply(p: number, wheels: WheelSet): boolean;
}

export interface SolveState {
  u: number;
  v: number;
  r: number;
  /** Steering input (rad). */
  p: number;
  converged: boolean;
  iterations: number;
}

export function newSolveState(): SolveState {
  return { u: 1, v: 0, r: 0, p: 0, converged: false, iterations: 0 };
}

const MAX_ITERATIONS = 40;
const TOLERANCE = 1e-10;

// Scratch: residuals g1 (N), g2 (N·m) and partial derivatives, in a typed array (doubles held
// in module-level `let`s would be boxed on every write and flood the young generation).
const S = new Float64Array(8);
const G1 = 0;
const G2 = 1;
const G1V = 2;
const G2V = 3;
const G1R = 4;
const G2R = 5;
const G1P = 6;
const G2P = 7;

/** Evaluate tyre forces and the tyre parts of residuals and Jacobian at (u, v, r). */
function assemble(w: WheelSet, u: number, v: number, r: number, withSteer: boolean): void {
  let g1 = 0;
  let g2 = 0;
  let g1v = 0;
  let g2v = 0;
  let g1r = 0;
  let g2r = 0;
  let g1p = 0;
  let g2p = 0;
  const n = w.count;
  const floor = 1e-9 * (Math.abs(u) + Math.abs(v) + 1e-3);
  for (let i = 0; i < n; i++) {
    const x = w.x[i] as number;
    const y = w.y[i] as number;
    const s = w.sinSteer[i] as number;
    const c = w.cosSteer[i] as number;
    const vx = u - r * y;
    const vy = v + r * x;
    const num = vx * s - vy * c;
    let den = vx * c + vy * s;
    const sgn = den < 0 ? -1 : 1;
    if (Math.abs(den) < floor) den = sgn * floor;
    const aden = Math.abs(den);
    const sigma = num / aden;
    // Tyre force and slope (brush, PHYSICS.md §5.5, or linear), inlined for speed.
    const stiffness = w.stiffness[i] as number;
    let f: number;
    let fs: number;
    if (w.brush) {
      const muFz = (w.friction[i] as number) * (w.load[i] as number);
      if (muFz > 0) {
        const t = (stiffness / (3 * muFz)) * (sigma < 0 ? -sigma : sigma);
        if (t >= 1) {
          f = sigma < 0 ? -muFz : muFz;
          fs = 0;
        } else {
          const m = muFz * t * (3 - 3 * t + t * t);
          f = sigma < 0 ? -m : m;
          const one = 1 - t;
          fs = stiffness * one * one;
        }
      } else {
        f = 0;
        fs = 0;
      }
    } else {
      f = stiffness * sigma;
      fs = stiffness;
    }
    w.sigma[i] = sigma;
    w.force[i] = f;
    w.lateralSpeed[i] = num;
    w.rollingSpeed[i] = den;
    const arm = x * c + y * s;
    const den2 = den * den;
    const dsv = (-c * aden - sgn * num * s) / den2;
    const dsr = ((-y * s - x * c) * aden - sgn * num * (x * s - y * c)) / den2;
    g1 += f * c;
    g2 += f * arm;
    g1v += fs * dsv * c;
    g2v += fs * dsv * arm;
    g1r += fs * dsr * c;
    g2r += fs * dsr * arm;
    if (withSteer) {
      const dd = w.steerSlope[i] as number;
      if (dd !== 0) {
        const dsp = sgn * (1 + sigma * sigma) * dd;
        g1p += fs * dsp * c - f * s * dd;
        g2p += fs * dsp * arm + f * (-x * s + y * c) * dd;
      }
    }
  }
  S[G1] = g1;
  S[G2] = g2;
  S[G1V] = g1v;
  S[G2V] = g2v;
  S[G1R] = g1r;
  S[G2R] = g2r;
  S[G1P] = g1p;
  S[G2P] = g2p;
}

/**
 * Fixed steer angles: solve (v, r) at forward speed u. Start from state.v, state.r.
 * `mass` (kg) and `xcg` (m) add the lateral-acceleration term; pass mass 0 for low speed.
 */
export function solveFixedSteer(
  w: WheelSet,
  u: number,
  mass: number,
  xcg: number,
  state: SolveState,
): void {
  const scale = w.frictionScale();
  const lever = leverScale(w);
  let v = state.v;
  let r = state.r;
  let norm = residualFixed(w, u, v, r, mass, xcg, lever);
  let it = 0;
  let converged = false;
  for (; it < MAX_ITERATIONS; it++) {
    if (Math.abs(S[G1]!) < TOLERANCE * scale && Math.abs(S[G2]!) < TOLERANCE * scale * lever) {
      converged = true;
      break;
    }
    const a11 = S[G1V]!;
    const a12 = S[G1R]! - mass * u;
    const a21 = S[G2V]!;
    const a22 = S[G2R]! - mass * u * xcg;
    const det = a11 * a22 - a12 * a21;
    if (!Number.isFinite(det) || det === 0) break;
    let dv = -(a22 * S[G1]! - a12 * S[G2]!) / det;
    let dr = -(-a21 * S[G1]! + a11 * S[G2]!) / det;
    let accepted = false;
    for (let k = 0; k < 12; k++) {
      const trial = residualFixed(w, u, v + dv, r + dr, mass, xcg, lever);
      if (trial < norm || trial === 0) {
        v += dv;
        r += dr;
        norm = trial;
        accepted = true;
        break;
      }
      dv /= 2;
      dr /= 2;
    }
    if (!accepted) {
      residualFixed(w, u, v, r, mass, xcg, lever);
      break;
    }
  }
  state.u = u;
  state.v = v;
  state.r = r;
  state.converged = converged;
  state.iterations = it;
}

function residualFixed(
  w: WheelSet,
  u: number,
  v: number,
  r: number,
  mass: number,
  xcg: number,
  lever: number,
): number {
  assemble(w, u, v, r, false);
  S[G1] = S[G1]! - mass * u * r;
  S[G2] = S[G2]! - mass * u * r * xcg;
  const b = S[G2]! / lever;
  return S[G1]! * S[G1]! + b * b;
}

/**
 * Fixed path radius R of the origin (r = √(u² + v²)/R): solve the lateral speed v and the
 * steering input p (as the driver steers to follow the radius). Start from state.v, state.p.
 */
export function solveAtRadius(
  w: WheelSet,
  map: SteerMap,
  u: number,
  radius: number,
  mass: number,
  xcg: number,
  state: SolveState,
): void {
  const scale = w.frictionScale();
  const lever = leverScale(w);
  let v = state.v;
  let p = state.p;
  let norm = residualRadius(w, map, u, v, p, radius, mass, xcg, lever);
  let it = 0;
  let converged = false;
  for (; it < MAX_ITERATIONS && Number.isFinite(norm); it++) {
    if (Math.abs(S[G1]!) < TOLERANCE * scale && Math.abs(S[G2]!) < TOLERANCE * scale * lever) {
      converged = true;
      break;
    }
    const speed = Math.sqrt(u * u + v * v);
    const drdv = v / (radius * speed);
    const a11 = S[G1V]! + S[G1R]! * drdv - mass * u * drdv;
    const a12 = S[G1P]!;
    const a21 = S[G2V]! + S[G2R]! * drdv - mass * u * drdv * xcg;
    const a22 = S[G2P]!;
    const det = a11 * a22 - a12 * a21;
    if (!Number.isFinite(det) || det === 0) break;
    let dv = -(a22 * S[G1]! - a12 * S[G2]!) / det;
    let dp = -(-a21 * S[G1]! + a11 * S[G2]!) / det;
    // Keep steps physical: steering input moves at most 0.2 rad per iteration.
    if (Math.abs(dp) > 0.2) {
      const f = 0.2 / Math.abs(dp);
      dp *= f;
      dv *= f;
    }
    let accepted = false;
    for (let k = 0; k < 12; k++) {
      const trial = residualRadius(w, map, u, v + dv, p + dp, radius, mass, xcg, lever);
      if (trial < norm || trial === 0) {
        v += dv;
        p += dp;
        norm = trial;
        accepted = true;
        break;
      }
      dv /= 2;
      dp /= 2;
    }
    if (!accepted) {
      residualRadius(w, map, u, v, p, radius, mass, xcg, lever);
      break;
    }
  }
  state.u = u;
  state.v = v;
  state.p = p;
  state.r = Math.sqrt(u * u + v * v) / radius;
  state.converged = converged;
  state.iterations = it;
}

function residualRadius(
  w: WheelSet,
  map: SteerMap,
  u: number,
  v: number,
  p: number,
  radius: number,
  mass: number,
  xcg: number,
  lever: number,
): number {
  if (!map.apply(p, w)) return Infinity;
  const r = Math.sqrt(u * u + v * v) / radius;
  assemble(w, u, v, r, true);
  S[G1] = S[G1]! - mass * u * r;
  S[G2] = S[G2]! - mass * u * r * xcg;
  const b = S[G2]! / lever;
  return S[G1]! * S[G1]! + b * b;
}

/**
 * Fixed yaw rate r and forward speed u: solve the lateral speed v from the lateral balance
 * alone (skid steer: the side-thrust difference balances the yaw moment; crab: r = 0).
 * The residual decreases monotonically in v, so a bracketed Newton/bisection always converges,
 * also when tyres are fully sliding (piecewise-constant residual).
 */
export function solveLateral(
  w: WheelSet,
  u: number,
  r: number,
  mass: number,
  state: SolveState,
): void {
  const scale = w.frictionScale();
  const target = mass * u * r;
  let v = state.v;
  let g = lateralResidual(w, u, v, r, target);
  let it = 0;
  if (Math.abs(g) <= TOLERANCE * scale) {
    finish(state, u, v, r, true, 0);
    return;
  }
  // Bracket the root: g decreases with v.
  let step = Math.max(Math.abs(u), Math.abs(r) * leverScale(w), 1e-3) * 0.25;
  let lo = v;
  let hi = v;
  let glo = g;
  let ghi = g;
  if (g > 0) {
    while (ghi > 0 && it < 200) {
      lo = hi;
      glo = ghi;
      hi += step;
      step *= 2;
      ghi = lateralResidual(w, u, hi, r, target);
      it++;
    }
  } else {
    while (glo < 0 && it < 200) {
      hi = lo;
      ghi = glo;
      lo -= step;
      step *= 2;
      glo = lateralResidual(w, u, lo, r, target);
      it++;
    }
  }
  if (!(glo >= 0 && ghi <= 0)) {
    lateralResidual(w, u, v, r, target);
    finish(state, u, v, r, false, it);
    return;
  }
  v = (lo + hi) / 2;
  let converged = false;
  for (; it < 400; it++) {
    g = lateralResidual(w, u, v, r, target);
    if (Math.abs(g) <= TOLERANCE * scale || hi - lo <= 1e-13 * (Math.abs(u) + Math.abs(r) + 1)) {
      converged = true;
      break;
    }
    if (g > 0) lo = v;
    else hi = v;
    const newton = S[G1V]! < 0 ? v - g / S[G1V]! : NaN;
    v = newton > lo && newton < hi ? newton : (lo + hi) / 2;
  }
  finish(state, u, v, r, converged, it);
}

function lateralResidual(w: WheelSet, u: number, v: number, r: number, target: number): number {
  assemble(w, u, v, r, false);
  return S[G1]! - target;
}

function finish(
  state: SolveState,
  u: number,
  v: number,
  r: number,
  converged: boolean,
  iterations: number,
): void {
  state.u = u;
  state.v = v;
  state.r = r;
  state.converged = converged;
  state.iterations = iterations;
}

/** Characteristic lever arm (m) for yaw residuals: largest wheel distance from the origin. */
function leverScale(w: WheelSet): number {
  let m = 0;
  for (let i = 0; i < w.count; i++) {
    const xi = w.x[i] as number;
    const yi = w.y[i] as number;
    const d = Math.sqrt(xi * xi + yi * yi);
    if (d > m) m = d;
  }
  return m > 0 ? m : 1;
}
