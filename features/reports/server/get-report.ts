import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reportShares, reportVersions } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { isStaff } from "@/lib/authz/policy";
import type { TReportDto } from "@/features/reports/schemas/report";
import { loadReport } from "@/features/reports/server/report-access";
import { toReportDto } from "@/features/reports/server/report-dto";

/** A report with its versions; staff also see the shares and opened times. */
export async function getReport({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TReportDto> {
  const report = await loadReport(db, actor, id, "read");
  const [versions, shares] = await Promise.all([
    db
      .select({
        version: reportVersions.version,
        issuedAt: reportVersions.issuedAt,
        supersededAt: reportVersions.supersededAt,
      })
      .from(reportVersions)
      .where(eq(reportVersions.reportId, id))
      .orderBy(asc(reportVersions.version)),
    db
      .select()
      .from(reportShares)
      .where(eq(reportShares.reportId, id))
      .orderBy(asc(reportShares.sharedAt)),
  ]);
  return toReportDto(report, versions, shares, isStaff(actor));
}
