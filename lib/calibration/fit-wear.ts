import { Matrix, SingularValueDecomposition } from "ml-matrix";
import { nnls } from "./nnls";
import { WEAR_TERMS, type TFitResult, type TMultipliers, type TWearInterval } from "./types";

/** Fewer measured intervals than this leave the two multipliers to chance. */
export const MIN_INTERVALS = 4;
/** Intervals must cover at least this many operating hours in total (summed over positions). */
export const MIN_HOURS_COVERED = 200;
/**
 * Above this condition number the readings cannot tell rolling wear from scrub wear: a condition
 * index over 30 marks strong collinearity (Belsley, Kuh & Welsch, "Regression Diagnostics", 1980).
 */
export const MAX_CONDITION_NUMBER = 30;

const hoursOf = (iv: TWearInterval) => iv.toHour - iv.fromHour;

/**
 * Fits non-negative multipliers on the wear model's terms so that, over each measured interval,
 * Δdepth ≈ Δh/100 · Σ_k m_k · component_k. Refuses, in a dealer's words, when the readings are
 * too few, cover too few hours, or cannot separate the terms.
 */
export function fitWear(intervals: readonly TWearInterval[]): TFitResult {
  const n = intervals.length;
  const hoursCovered = intervals.reduce((s, iv) => s + hoursOf(iv), 0);
  const refuse = (
    code: Extract<TFitResult, { ok: false }>["code"],
    reason: string,
  ): TFitResult => ({
    ok: false,
    code,
    reason,
    n,
    hoursCovered,
  });
  if (n < MIN_INTERVALS) {
    return refuse(
      "too-few-readings",
      `Only ${n} measured interval${n === 1 ? "" : "s"} between readings; at least ${MIN_INTERVALS} are needed. Measure the tyres again at the next service visit.`,
    );
  }
  if (hoursCovered < MIN_HOURS_COVERED) {
    return refuse(
      "too-few-hours",
      `The readings span only ${Math.round(hoursCovered)} tyre-hours; at least ${MIN_HOURS_COVERED} are needed before wear shows above measuring error.`,
    );
  }
  const rows = intervals.map((iv) => WEAR_TERMS.map((t) => (hoursOf(iv) / 100) * iv.components[t]));
  const y = intervals.map((iv) => iv.loss);
  const x = new Matrix(rows);
  const norms = WEAR_TERMS.map((_, j) => x.getColumnVector(j).norm("frobenius"));
  if (norms.every((v) => v === 0)) {
    return refuse(
      "no-wear",
      "The model predicts no wear for these tyres, so there is nothing to scale.",
    );
  }
  // Condition of the column-scaled matrix: independent of the units of each term.
  const scaled = new Matrix(rows.map((r) => r.map((v, j) => (norms[j]! > 0 ? v / norms[j]! : 0))));
  const singular = new SingularValueDecomposition(scaled, {
    computeLeftSingularVectors: false,
    computeRightSingularVectors: false,
  }).diagonal;
  const smallest = Math.min(...singular);
  const conditionNumber = smallest > 0 ? Math.max(...singular) / smallest : Infinity;
  if (!(conditionNumber <= MAX_CONDITION_NUMBER)) {
    return refuse(
      "ill-conditioned",
      "These readings cannot tell rolling wear from scrub: every tyre measured wears in the same proportion of the two. Add readings from tyres that scrub differently (front and rear, or another steering layout), or let the machine use its group's calibration.",
    );
  }
  const solution = nnls(x, y);
  const multipliers = Object.fromEntries(
    WEAR_TERMS.map((t, j) => [t, solution[j] ?? 0]),
  ) as TMultipliers;
  const fitted = rows.map((r) => r.reduce((s, v, j) => s + v * (solution[j] ?? 0), 0));
  const residuals = y.map((v, i) => v - fitted[i]!);
  // The model has no intercept, so R² is taken about zero (uncentred), as usual for regression
  // through the origin (Eisenhauer, "Regression through the Origin", Teaching Statistics 2003).
  const ssTot = y.reduce((s, v) => s + v * v, 0);
  const ssRes = residuals.reduce((s, v) => s + v * v, 0);
  return {
    ok: true,
    multipliers,
    quality: {
      r2: ssTot > 0 ? 1 - ssRes / ssTot : 1,
      rmse: Math.sqrt(ssRes / n),
      residuals,
      n,
      hoursCovered,
      conditionNumber,
    },
  };
}
