import { BLOCK_MESSAGES, type TBlockCode } from "@/lib/billing/allowance";

/** Where a blocked estimator's billing admin fixes it. */
export const BILLING_HREF = "/billing";

/** Thrown when a report may not be issued; the message is for the estimator who tried. */
export class ReportAllowanceError extends Error {
  readonly code: TBlockCode;
  readonly billingHref: string;
  constructor(code: TBlockCode) {
    super(BLOCK_MESSAGES[code]);
    this.name = "ReportAllowanceError";
    this.code = code;
    this.billingHref = BILLING_HREF;
  }
}
