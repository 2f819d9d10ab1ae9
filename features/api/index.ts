// Public server entry of the api feature: API tokens, idempotency keys and the OpenAPI document.
export { authenticateRequest, type TRequestAuth } from "./server/authenticate-request";
export { withIdempotency } from "./server/idempotency";
export { auditTokenRequest } from "./server/audit-token-request";
export { createApiToken } from "./server/create-api-token";
export { listApiTokens } from "./server/list-api-tokens";
export { revokeApiToken } from "./server/revoke-api-token";
export type { TApiTokenDto, TCreateApiTokenInput } from "./schemas/api-token";
export { getOpenApiDocument, type TOpenApiDocument } from "./openapi/document";
