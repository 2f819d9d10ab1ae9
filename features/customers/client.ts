// Public browser entry of the customers feature: query hooks, key factories and components.
export { customerKeys, useCustomer, useCustomers } from "./api/customers";
export { siteKeys, useCustomerSites } from "./api/sites";
export { CUSTOMER_KINDS } from "./schemas/customer";
export { SURFACE_LABELS } from "./schemas/site";
