// Public server entry of the calibration feature (tread readings, wear calibration, tyre plan).
export { getMachineCalibration } from "./server/get-machine-calibration";
export { getTyrePlan } from "./server/get-tyre-plan";
export { getTreadAlerts } from "./server/get-tread-alerts";
export type { TMachineCalibrationDto, TTyrePlanDto } from "./schemas/calibration";
