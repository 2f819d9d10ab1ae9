import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reportShares } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TReportDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports, loadReport } from "@/features/reports/server/report-access";
import { getReport } from "@/features/reports/server/get-report";

/** Withdraws every live share of a report: the customer no longer sees it (404), history stays. */
export async function withdrawReportShare({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TReportDto> {
  assertMayPrepareReports(actor);
  await loadReport(db, actor, id, "write");
  await db
    .update(reportShares)
    .set({ withdrawnAt: new Date() })
    .where(and(eq(reportShares.reportId, id), isNull(reportShares.withdrawnAt)));
  return getReport({ db, actor, id });
}
