// Public server entry of the calibration feature (tread readings, wear calibration, tyre plan).
export { getMachineCalibration } from "./server/get-machine-calibration";
export { getTyrePlan } from "./server/get-tyre-plan";
export { getTreadAlerts } from "./server/get-tread-alerts";
export type { TMachineCalibrationDto, TTyrePlanDto } from "./schemas/calibration";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZReadingCreate } from "./schemas/reading";
export { ZImport as ZReadingsImport } from "./server/import-readings";
