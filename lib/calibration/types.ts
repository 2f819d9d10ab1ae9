/** Shared shapes of the calibration fit, the tyre plan and the alerts. Depths in mm, time in hours. */
export const TYRE_POSITIONS = ["front-left", "front-right", "rear-left", "rear-right"] as const;
export type TTyrePosition = (typeof TYRE_POSITIONS)[number];

/**
 * What the wear model predicts for one position, split into the terms the fit scales:
 * rolling (base) wear and scrub wear, both in mm per 100 operating hours. Today these are the
 * engine's `wearPer100h.base` and `.scrub`; a richer model maps its own terms onto this list.
 */
export type TWearComponents = { base: number; scrub: number };
export const WEAR_TERMS = ["base", "scrub"] as const;
export type TWearTerm = (typeof WEAR_TERMS)[number];

/** Non-negative multipliers on the model's terms: 1 = the model as published. */
export type TMultipliers = Record<TWearTerm, number>;
export const UNCALIBRATED: TMultipliers = { base: 1, scrub: 1 };

/** One measured interval: depth lost at a position between two readings of the same fitment. */
export type TWearInterval = {
  machineId: string;
  position: TTyrePosition;
  fromHour: number;
  toHour: number;
  /** Mean depth lost over the interval (mm); may be slightly negative from measuring noise. */
  loss: number;
  components: TWearComponents;
};

export type TFitQuality = {
  /** Uncentred coefficient of determination of measured against fitted loss (1 = perfect). */
  r2: number;
  /** Root-mean-square residual, mm. */
  rmse: number;
  /** Measured minus fitted loss per interval, mm, in the order of the intervals. */
  residuals: number[];
  /** Number of measured intervals used. */
  n: number;
  /** Operating hours covered by the intervals (sum over positions of their spans). */
  hoursCovered: number;
  /** Ratio of largest to smallest singular value of the column-scaled design matrix. */
  conditionNumber: number;
};

export type TRefusalCode = "too-few-readings" | "too-few-hours" | "ill-conditioned" | "no-wear";

export type TFitResult =
  | { ok: true; multipliers: TMultipliers; quality: TFitQuality }
  | { ok: false; code: TRefusalCode; reason: string; n: number; hoursCovered: number };

/**
 * What a calibrated estimate records in its inputs (and studies and reports built on it carry):
 * where the fitted multipliers came from and how well they fit.
 */
export type TCalibrationRecord = {
  source: "machine" | "pooled";
  multipliers: { base: number; scrub: number };
  r2: number;
  rmse: number;
  n: number;
  hoursCovered: number;
  pooledMachines: number | null;
  basisEstimateId: string;
};
