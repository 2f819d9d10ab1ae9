/** Calibration of the wear model from tread readings, the tyre plan and tread alerts. Pure. */
export * from "./types";
export { nnls } from "./nnls";
export { fitWear, MIN_INTERVALS, MIN_HOURS_COVERED, MAX_CONDITION_NUMBER } from "./fit-wear";
export { wearIntervals, currentFitment, meanDepth, type TReadingPoint } from "./intervals";
export {
  calibrateFleet,
  poolKeyOf,
  surfaceClass,
  type TCalibration,
  type TMachineCalibrationInput,
} from "./choose";
export { predictPositions, type TPositionBasis, type TPositionPrediction } from "./apply";
export { hoursPerWeek, dayNumber, isoFromDayNumber } from "./usage";
export {
  planPosition,
  monthlyOrders,
  dueBy,
  addDays,
  type TPlanItem,
  type TPlanPositionInput,
  type TPlanStatus,
  type TOrderLine,
} from "./plan";
export {
  positionAlerts,
  FAST_WEAR_RATIO,
  UNEVEN_MM,
  type TTreadAlert,
  type TAlertKind,
} from "./alerts";
export { computeFleet, type TFleetMachine, type TFleetMachineInput } from "./fleet";
export { calibratedEngineInputs } from "./engine-options";
export { parseReadingsCsv, parsePosition, type TParsedReadingRow } from "./readings-csv";
