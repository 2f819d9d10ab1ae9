import "server-only";
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { reportMessages } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TReportMessageDto } from "@/features/reports/schemas/report";
import { loadReport } from "@/features/reports/server/report-access";

/** The question thread of a report, oldest first. */
export async function listReportMessages({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TReportMessageDto[]> {
  await loadReport(db, actor, id, "read");
  const rows = await db
    .select()
    .from(reportMessages)
    .where(eq(reportMessages.reportId, id))
    .orderBy(asc(reportMessages.createdAt));
  return rows.map((m) => ({
    id: m.id,
    authorName: m.authorName,
    fromCustomer: m.fromCustomer,
    body: m.body,
    createdAt: m.createdAt.toISOString(),
  }));
}
