import "server-only";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { reportFileName, type TReportContent } from "@/lib/reports";
import { loadReportVersion, recordOpen } from "@/features/reports/server/get-report-version";
import { renderReportPdf } from "@/features/reports/pdf/render-report-pdf";

/** The PDF of one issued version with the file name to offer (customer, machine, version). */
export async function exportReportPdf({
  db,
  actor,
  id,
  version,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  version: number | "latest";
}): Promise<{ fileName: string; pdf: Buffer }> {
  const { report, row } = await loadReportVersion(db, actor, id, version);
  const content = row.content as TReportContent;
  const pdf = await renderReportPdf({
    content,
    reportId: report.id,
    version: row.version,
    supersededAt: row.supersededAt?.toISOString() ?? null,
    logo: row.logo,
    system: actor.unitSystem,
  });
  await recordOpen(db, actor, id);
  return {
    fileName: reportFileName({
      customer: content.customer.name,
      machine: content.options[0]?.machine.name ?? report.machineName,
      version: row.version,
      ext: "pdf",
    }),
    pdf,
  };
}
