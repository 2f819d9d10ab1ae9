// Public browser entry of the estimates feature: query hooks, key factories and components.
export { estimateKeys, useEstimate, useEstimates } from "./api/estimates";
export { EstimatesTable } from "./components/estimates-table";
