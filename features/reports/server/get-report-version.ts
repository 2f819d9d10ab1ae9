import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reportShares, reportVersions, type TReport, type TReportVersion } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { isStaff } from "@/lib/authz/policy";
import type { TReportVersionDto } from "@/features/reports/schemas/report";
import { loadReport } from "@/features/reports/server/report-access";
import { toVersionDto } from "@/features/reports/server/version-dto";
import { notFound, ApiError } from "@/features/platform";

/** "latest" or a version number from the path. */
export function versionParam(value: string | undefined): number | "latest" {
  if (value === "latest") return "latest";
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 100_000)
    throw new ApiError(404, "not_found", "No report version with that number.");
  return n;
}

export async function loadReportVersion(
  db: DbOrTx,
  actor: TActor,
  id: string,
  version: number | "latest",
): Promise<{ report: TReport; row: TReportVersion }> {
  const report = await loadReport(db, actor, id, "read");
  const wanted = version === "latest" ? report.latestVersion : version;
  const [row] = await db
    .select()
    .from(reportVersions)
    .where(and(eq(reportVersions.reportId, id), eq(reportVersions.version, wanted)));
  if (!row) throw notFound("report version");
  return { report, row };
}

/** A customer opening a shared report is what the dealer sees as first and last opened. */
export async function recordOpen(db: DbOrTx, actor: TActor, reportId: string) {
  if (isStaff(actor)) return;
  await db
    .update(reportShares)
    .set({
      firstOpenedAt: sql`coalesce(${reportShares.firstOpenedAt}, now())`,
      lastOpenedAt: sql`now()`,
      openCount: sql`${reportShares.openCount} + 1`,
    })
    .where(and(eq(reportShares.reportId, reportId), isNull(reportShares.withdrawnAt)));
}

/** One issued version as frozen, for the web page; records the customer's open. */
export async function getReportVersion({
  db,
  actor,
  id,
  version,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  version: number | "latest";
}): Promise<TReportVersionDto> {
  const { report, row } = await loadReportVersion(db, actor, id, version);
  await recordOpen(db, actor, id);
  return toVersionDto(row, report.latestVersion);
}
