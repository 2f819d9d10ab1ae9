// Public server entry of the estimates feature (running, storing and showing estimates, the
// per-turn CSV). Client code imports features/estimates/client.ts.
export { createEstimate } from "./server/create-estimate";
export { getEstimate, loadEstimate } from "./server/get-estimate";
export { listEstimates } from "./server/list-estimates";
export { loadDutyCycleForEstimate } from "./server/load-duty-cycle";
export type { TEstimateDto, TEstimateRow } from "./schemas/estimate";
export { estimateTurnsCsv } from "./lib/estimate-csv";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZEstimateCreate, ZEstimatePatch } from "./schemas/estimate";
export { ZEstimateListQuery } from "./schemas/estimate-list-query";
