// Public server entry of the platform feature: what every feature's server code stands on (the
// API's error shape, the JSON responder, paging, record access checks, health). Client code
// imports features/platform/client.ts instead, so no server-only module reaches the browser.
export {
  ApiError,
  fieldErrorsOf,
  forbidden,
  invalidInput,
  invalidReference,
  notFound,
  parseOrThrow,
  type TFieldErrors,
} from "./server/api-error";
export { confirmed, pathId, queryOf, readJson, respond } from "./server/respond";
export {
  bind,
  iso,
  likePattern,
  pageTotal,
  pageWindow,
  preparedShape,
  shapeFlags,
  toPage,
  totalColumn,
} from "./server/paging";
export {
  assertAccess,
  assertMayRead,
  assertMayRunEstimates,
  assertMayWrite,
  customerScope,
  type TRecordKind,
} from "./server/record-access";
export { found, isUuid } from "./server/found";
export { getHealth, type THealth } from "./server/get-health";
