import type { TCalibrationRecord } from "@/lib/calibration";
import type { TAssumption } from "@/lib/reports/assumptions";

/** The part of a calibration record a report states. */
export type TReportCalibration = Pick<
  TCalibrationRecord,
  "source" | "multipliers" | "r2" | "n" | "hoursCovered"
> &
  Partial<Pick<TCalibrationRecord, "pooledMachines">>;

const fixed = (v: number, digits: number) => v.toFixed(digits);

/** The report's calibration assumption: calibrated from readings (and on what), or defaults. */
export function calibrationAssumption(
  calibration: TReportCalibration | null,
  perPositionCalibrated: boolean,
): TAssumption {
  if (calibration) {
    const basis =
      calibration.source === "machine"
        ? "this machine's"
        : `${calibration.pooledMachines ?? "several"} similar machines'`;
    return {
      topic: "Calibration",
      text: `Wear figures are calibrated from ${calibration.n} of ${basis} tread readings over ${Math.round(calibration.hoursCovered)} operating hours (fit R² ${fixed(calibration.r2, 2)}): rolling wear × ${fixed(calibration.multipliers.base, 2)}, scrub wear × ${fixed(calibration.multipliers.scrub, 2)} of the engine's defaults.`,
      source:
        "Tread depths measured by the dealership at service visits; non-negative least-squares fit (Lawson & Hanson, Solving Least Squares Problems, 1974).",
    };
  }
  return perPositionCalibrated
    ? {
        topic: "Calibration",
        text: "Wear coefficients were calibrated from tread depths measured on this machine.",
        source: "Tread readings recorded by the dealership.",
      }
    : {
        topic: "Calibration",
        text: "Wear coefficients are uncalibrated defaults: measured tread depths at service visits will sharpen these figures.",
        source: "Engine defaults.",
      };
}
