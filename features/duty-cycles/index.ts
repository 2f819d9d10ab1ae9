// Public server entry of the duty-cycles feature (uploads, column mapping, import, builder).
export { getDutyCycle } from "./server/get-duty-cycle";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZCreateDutyCycle, ZDutyCycleListQuery, ZUpdateDutyCycle } from "./schemas/duty-cycle";
export {
  ZCreateMappingTemplate,
  ZMappingTemplateListQuery,
  ZUpdateMappingTemplate,
} from "./schemas/mapping-template";
