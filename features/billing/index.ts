// The billing feature's entry for higher features (reports): allowance checks and the counter.
export {
  consumeReportAllowance,
  type TAllowanceUse,
} from "@/features/billing/server/consume-report-allowance";
export { ReportAllowanceError, BILLING_HREF } from "@/features/billing/server/allowance-error";
export {
  getAllowanceSummary,
  type TAllowanceSummary,
} from "@/features/billing/server/get-allowance-summary";
