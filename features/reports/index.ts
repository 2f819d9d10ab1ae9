// The reports feature's public entry for higher features (calibration, api) and app/.
export type {
  TReportDto,
  TReportRow,
  TReportVersionDto,
  TReportMessageDto,
  TBrandingDto,
} from "@/features/reports/schemas/report";
export {
  ZReportCreate,
  ZReportDraftPatch,
  ZReportListQuery,
} from "@/features/reports/schemas/report";
export {
  reportKeys,
  useReports,
  useReport,
  useReportVersion,
} from "@/features/reports/api/reports";
// Request schemas, also read by the OpenAPI document (features/api/openapi).
export { ZBrandingPatch, ZReportMessage, ZReportShare } from "./schemas/report";
