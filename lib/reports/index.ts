export * from "@/lib/reports/content";
export { paybackOf } from "@/lib/reports/payback";
export { reportFileName } from "@/lib/reports/file-name";
export {
  reportStatus,
  REPORT_STATUSES,
  STATUS_LABELS,
  type TReportStatus,
} from "@/lib/reports/status";
export type { TAssumption } from "@/lib/reports/assumptions";
export type { TReportDutyCycleSummary } from "@/lib/reports/duty-cycle";
export * from "@/lib/reports/format";
