// Public server entry of the search feature (global search and the dashboard summary).
export { getDashboard } from "./server/get-dashboard";
export { searchWorkspace } from "./server/search-workspace";
export type { TSearchHit, TSearchResult } from "./schemas/search";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZSearchQuery } from "./schemas/search";
