import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reports, reportShares, type TReport } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, isStaff } from "@/lib/authz/policy";
import { forbidden, notFound } from "@/features/platform";

/** Has this issued report a live share with its customer? */
export async function isShared(db: DbOrTx, reportId: string): Promise<boolean> {
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(reportShares)
    .where(and(eq(reportShares.reportId, reportId), isNull(reportShares.withdrawnAt)));
  return (row?.n ?? 0) > 0;
}

/**
 * Loads a report the actor may see: staff of its dealership; a customer account only for its
 * own customer's reports that are issued and shared (withdrawn or draft answers 404, so their
 * existence does not leak). "write" also needs the role that prepares and shares reports.
 */
export async function loadReport(
  db: DbOrTx,
  actor: TActor,
  id: string,
  action: "read" | "write",
  opts: { lock?: boolean } = {},
): Promise<TReport> {
  const query = db
    .select()
    .from(reports)
    .where(and(eq(reports.id, id), eq(reports.dealershipId, actor.dealershipId)));
  const [report] = opts.lock ? await query.for("update") : await query;
  const owned = report && { dealershipId: report.dealershipId, customerId: report.customerId };
  if (!report || !can(actor, "report:read", owned)) throw notFound("report");
  if (!isStaff(actor) && (report.latestVersion === 0 || !(await isShared(db, report.id))))
    throw notFound("report");
  if (action === "write" && !can(actor, "report:share", owned)) throw forbidden("this report");
  return report;
}

/** Throws 403 unless the actor may prepare and issue reports. */
export function assertMayPrepareReports(actor: TActor) {
  if (!can(actor, "report:share")) throw forbidden("reports");
}
