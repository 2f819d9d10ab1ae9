import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reports } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZReportDraftPatch, type TReportDto } from "@/features/reports/schemas/report";
import { assertMayPrepareReports, loadReport } from "@/features/reports/server/report-access";
import { getReport } from "@/features/reports/server/get-report";
import { parseOrThrow } from "@/features/platform";

/** Edits the draft fields; issued versions keep what they were issued with. */
export async function updateReport({
  db,
  actor,
  id,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  input: unknown;
}): Promise<TReportDto> {
  assertMayPrepareReports(actor);
  await loadReport(db, actor, id, "write");
  const values = parseOrThrow(ZReportDraftPatch, input);
  await db
    .update(reports)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(reports.id, id));
  return getReport({ db, actor, id });
}
