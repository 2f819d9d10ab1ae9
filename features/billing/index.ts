import "server-only";
import type { DbOrTx } from "@/db/client";

/**
 * Placeholder for the billing feature's allowance hook (issue 13 replaces this file): every
 * report issue is allowed. Called inside the issuing transaction, so the real one can lock and
 * count usage atomically.
 */
export class ReportAllowanceError extends Error {
  constructor(
    readonly code: "no_plan" | "quota_reached" | "cancelled" | "past_due_expired",
    message: string,
    readonly billingHref: string,
  ) {
    super(message);
    this.name = "ReportAllowanceError";
  }
}

export async function consumeReportAllowance(
  _tx: DbOrTx,
  _options: { dealershipId: string; reportId: string },
): Promise<void> {}
