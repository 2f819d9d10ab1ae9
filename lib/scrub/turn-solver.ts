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

/** Jacobian scratch: a11, a12, a21, a22 of the current 2×2 Newton system. */
const J = new Float64Array(4);

/**
 * A two-unknown balance problem for {@link newton2}: residual(a, b) evaluates the tyre forces and
 * leaves the residuals in S (returning the scaled squared norm); jacobian() writes J for the
 * point last evaluated.
 */
interface BalanceProblem {
  residual(a: number, b: number): number;
  jacobian(a: number, b: number): void;
}

/** Unknowns (v, r) at fixed steer. */
class FixedSteerProblem implements BalanceProblem {
  w!: WheelSet;
  u = 1;
  mass = 0;
  xcg = 0;
  lever = 1;

  residual(v: number, r: number): number {
    assemble(this.w, this.u, v, r, false);
    return addInertia(this.mass * this.u * r, this.xcg, this.lever);
  }

  jacobian(): void {
    J[0] = S[G1V]!;
    J[1] = S[G1R]! - this.mass * this.u;
    J[2] = S[G2V]!;
    J[3] = S[G2R]! - this.mass * this.u * this.xcg;
  }
}

/** Unknowns (v, p) at fixed path radius of the origin: r = √(u² + v²)/R. */
class RadiusProblem implements BalanceProblem {
  w!: WheelSet;
  map!: SteerMap;
  u = 1;
  radius = 1;
  mass = 0;
  xcg = 0;
  lever = 1;

  residual(v: number, p: number): number {
    if (!this.map.apply(p, this.w)) return Infinity;
    const r = Math.sqrt(this.u * this.u + v * v) / this.radius;
    assemble(this.w, this.u, v, r, true);
    return addInertia(this.mass * this.u * r, this.xcg, this.lever);
  }

  jacobian(v: number): void {
    const drdv = v / (this.radius * Math.sqrt(this.u * this.u + v * v));
    const inertia = this.mass * this.u * drdv;
    J[0] = S[G1V]! + S[G1R]! * drdv - inertia;
    J[1] = S[G1P]!;
    J[2] = S[G2V]! + S[G2R]! * drdv - inertia * this.xcg;
    J[3] = S[G2P]!;
  }
}

/** Subtract the inertia force m·a_y (at x_cg) from the residuals; return the scaled norm². */
function addInertia(force: number, xcg: number, lever: number): number {
  S[G1] = S[G1]! - force;
  S[G2] = S[G2]! - force * xcg;
  const b = S[G2]! / lever;
  return S[G1]! * S[G1]! + b * b;
}

const NEWTON = { a: 0, b: 0, converged: false, iterations: 0 };

/**
 * Damped Newton on two unknowns: full step, halved until the scaled residual norm falls;
 * `maxStepB` caps the second unknown's step (steering input). Stops when both residuals are
 * below TOLERANCE relative to Σ μN (and its lever arm).
 */
function newton2(
  problem: BalanceProblem,
  a0: number,
  b0: number,
  scale: number,
  lever: number,
  maxStepB: number,
): void {
  let a = a0;
  let b = b0;
  let norm = problem.residual(a, b);
  let it = 0;
  let converged = false;
  for (; it < MAX_ITERATIONS && Number.isFinite(norm); it++) {
    if (Math.abs(S[G1]!) < TOLERANCE * scale && Math.abs(S[G2]!) < TOLERANCE * scale * lever) {
      converged = true;
      break;
    }
    problem.jacobian(a, b);
    const det = J[0]! * J[3]! - J[1]! * J[2]!;
    if (!Number.isFinite(det) || det === 0) break;
    let da = -(J[3]! * S[G1]! - J[1]! * S[G2]!) / det;
    let db = -(-J[2]! * S[G1]! + J[0]! * S[G2]!) / det;
    if (Math.abs(db) > maxStepB) {
      const f = maxStepB / Math.abs(db);
      da *= f;
      db *= f;
    }
    let accepted = false;
    for (let k = 0; k < 12; k++) {
      const trial = problem.residual(a + da, b + db);
      if (trial < norm || trial === 0) {
        a += da;
        b += db;
        norm = trial;
        accepted = true;
        break;
      }
      da /= 2;
      db /= 2;
    }
    if (!accepted) {
      problem.residual(a, b);
      break;
    }
  }
  NEWTON.a = a;
  NEWTON.b = b;
  NEWTON.converged = converged;
  NEWTON.iterations = it;
}

const fixedSteer = new FixedSteerProblem();
const atRadius = new RadiusProblem();

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
  const lever = leverScale(w);
  fixedSteer.w = w;
  fixedSteer.u = u;
  fixedSteer.mass = mass;
  fixedSteer.xcg = xcg;
  fixedSteer.lever = lever;
  newton2(fixedSteer, state.v, state.r, w.frictionScale(), lever, Infinity);
  state.u = u;
  state.v = NEWTON.a;
  state.r = NEWTON.b;
  state.converged = NEWTON.converged;
  state.iterations = NEWTON.iterations;
}

/**
 * Fixed path radius R of the origin (r = √(u² + v²)/R): solve the lateral speed v and the
 * steering input p (as the driver steers to follow the radius). Start from state.v, state.p.
 * The steering input moves at most 0.2 rad per iteration.
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
  const lever = leverScale(w);
  atRadius.w = w;
  atRadius.map = map;
  atRadius.u = u;
  atRadius.radius = radius;
  atRadius.mass = mass;
  atRadius.xcg = xcg;
  atRadius.lever = lever;
  newton2(atRadius, state.v, state.p, w.frictionScale(), lever, 0.2);
  state.u = u;
  state.v = NEWTON.a;
  state.p = NEWTON.b;
  state.r = Math.sqrt(u * u + NEWTON.a * NEWTON.a) / radius;
  state.converged = NEWTON.converged;
  state.iterations = NEWTON.iterations;
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
