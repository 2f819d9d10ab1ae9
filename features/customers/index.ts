// Public server entry of the customers feature (customers, contacts, sites). Client code imports
// features/customers/client.ts.
export { getCustomer, loadCustomer } from "./server/get-customer";
export { getSite, loadSite } from "./server/get-site";
export { listCustomers } from "./server/list-customers";
export { listCustomerChoices } from "./server/list-customer-choices";
export { listSites } from "./server/list-sites";
export { resolveCustomerField } from "./server/resolve-customer";
export { fillSurfaces, MissingSurfaceMixError, type TSurfaceMixShares } from "./lib/fill-surfaces";
export type { TCustomerDto, TCustomerRow } from "./schemas/customer";
export type { TSiteDto, TSurfaceMix } from "./schemas/site";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZCustomerInput, ZCustomerPatch } from "./schemas/customer";
export { ZSiteInput, ZSitePatch } from "./schemas/site";
export { ZCustomerListQuery, ZSiteListQuery } from "./schemas/customer-list-query";
