/**
 * Least-squares fit of a turn's heading against distance travelled with the shape of a
 * straight–arc–straight path: heading ψ0 before the arc, rising linearly over the arc from
 * s = a to s = b, ψ1 after it. The arc's radius is (b − a) / |ψ1 − ψ0|. The fit uses every
 * course point of the turn and its run-in and run-out, so it places the ends of the arc between
 * samples: a 1 Hz log with 4 m between fixes still gives the arc length to a few decimetres.
 * A course taken along a chord is the mean heading over the chord (exactly so on a circle, to
 * first order elsewhere), so each point is compared with the model averaged over its chord:
 * otherwise long chords round the corners of the ramp and lengthen the arc.
 * This is the usual piecewise-linear heading model for reconstructing a path's horizontal
 * alignment (tangent–circular curve–tangent) from position fixes.
 */

export type TRampFit = {
  /** Distance at which the arc starts and ends (same scale as the input s). */
  a: number;
  b: number;
  /** Heading before and after the arc (input units). */
  psi0: number;
  psi1: number;
};

/** Course points sorted by distance s. */
export type TCoursePoints = {
  s: ArrayLike<number>;
  psi: ArrayLike<number>;
  /** Length of the chord each course was taken over (same scale as s). */
  chord: ArrayLike<number>;
  length: number;
};

/** `guess` brackets the arc; undefined when the data cannot tell where it starts and ends. */
export function fitHeadingRamp(
  points: TCoursePoints,
  guess: { a: number; b: number; reach: number },
): TRampFit | undefined {
  const { s, length: n } = points;
  if (n < 6) return undefined;
  const sse = (a: number, b: number) => solve(points, a, b);
  // Coarse grid around the detector's guess, then alternating golden-section refinement: the
  // error surface is continuous in (a, b) and smooth between data points.
  const steps = 8;
  const h = guess.reach / steps;
  let best = { a: guess.a, b: guess.b, e: Infinity };
  for (let i = -steps; i <= steps; i++) {
    for (let j = -steps; j <= steps; j++) {
      const a = guess.a + i * h;
      const b = guess.b + j * h;
      if (b - a <= h) continue;
      const e = sse(a, b).e;
      if (e < best.e) best = { a, b, e };
    }
  }
  if (!Number.isFinite(best.e)) return undefined;
  let { a, b } = best;
  for (let round = 0; round < 3; round++) {
    a = goldenMin((x) => (x < b ? sse(x, b).e : Infinity), a - h, Math.min(a + h, b - 1e-6));
    b = goldenMin((x) => (x > a ? sse(a, x).e : Infinity), Math.max(b - h, a + 1e-6), b + h);
  }
  const fit = sse(a, b);
  // The flats and the ramp each need data of their own, or the ends of the arc are guesses.
  let before = 0;
  let inside = 0;
  let after = 0;
  for (let i = 0; i < n; i++) {
    const x = s[i]!;
    if (x < a) before++;
    else if (x > b) after++;
    else inside++;
  }
  if (before < 2 || after < 2 || inside < 2 || !Number.isFinite(fit.e)) return undefined;
  return { a, b, psi0: fit.psi0, psi1: fit.psi1 };
}

/** Integral of the unit ramp from a to b, from −∞ to x. */
function rampIntegral(x: number, a: number, b: number): number {
  if (x <= a) return 0;
  if (x >= b) return (b - a) / 2 + (x - b);
  return (x - a) ** 2 / (2 * (b - a));
}

/** The unit ramp's mean over a chord of length w centred on x. */
function rampAt(x: number, w: number, a: number, b: number): number {
  if (w <= 0) return x <= a ? 0 : x >= b ? 1 : (x - a) / (b - a);
  return (rampIntegral(x + w / 2, a, b) - rampIntegral(x - w / 2, a, b)) / w;
}

/** Best ψ0, ψ1 for given arc ends and the squared error left. */
function solve({ s, psi, chord, length: n }: TCoursePoints, a: number, b: number) {
  let A = 0;
  let B = 0;
  let C = 0;
  let r0 = 0;
  let r1 = 0;
  for (let i = 0; i < n; i++) {
    const u = rampAt(s[i]!, chord[i]!, a, b);
    const w = 1 - u;
    const y = psi[i]!;
    A += w * w;
    B += w * u;
    C += u * u;
    r0 += w * y;
    r1 += u * y;
  }
  const det = A * C - B * B;
  if (!(det > 1e-12)) return { e: Infinity, psi0: NaN, psi1: NaN };
  const psi0 = (C * r0 - B * r1) / det;
  const psi1 = (A * r1 - B * r0) / det;
  let e = 0;
  for (let i = 0; i < n; i++) {
    const u = rampAt(s[i]!, chord[i]!, a, b);
    const d = psi[i]! - (psi0 + (psi1 - psi0) * u);
    e += d * d;
  }
  return { e, psi0, psi1 };
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Minimum of f on [lo, hi] by golden-section search (f unimodal near the bracket). */
function goldenMin(f: (x: number) => number, lo: number, hi: number): number {
  if (!(hi > lo)) return lo;
  let x1 = hi - GOLDEN * (hi - lo);
  let x2 = lo + GOLDEN * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let k = 0; k < 30; k++) {
    if (f1 <= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - GOLDEN * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + GOLDEN * (hi - lo);
      f2 = f(x2);
    }
  }
  return f1 <= f2 ? x1 : x2;
}
