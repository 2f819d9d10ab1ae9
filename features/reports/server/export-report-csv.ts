import "server-only";
import Papa from "papaparse";
import type { DbOrTx } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { reportFileName, type TReportContent } from "@/lib/reports";
import { loadReportVersion } from "@/features/reports/server/get-report-version";
import { estimateTurnsCsv } from "@/features/estimates";

/**
 * The per-turn CSV annex of an issued version: the estimate's per-turn, per-wheel table (SI units)
 * for every option, with the option's name as the first column.
 */
export async function exportReportCsv({
  db,
  actor,
  id,
  version,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
  version: number | "latest";
}): Promise<{ fileName: string; csv: string }> {
  const { report, row } = await loadReportVersion(db, actor, id, version);
  const content = row.content as TReportContent;
  let header: string[] = [];
  const rows: string[][] = [];
  for (const option of content.options) {
    const parsed = Papa.parse<string[]>(estimateTurnsCsv(option.result, content.currency).trim(), {
      skipEmptyLines: true,
    });
    const [head, ...body] = parsed.data;
    header = ["option", ...(head ?? [])];
    for (const r of body) rows.push([option.label, ...r]);
  }
  return {
    fileName: reportFileName({
      customer: content.customer.name,
      machine: content.options[0]?.machine.name ?? report.machineName,
      version: row.version,
      ext: "csv",
      suffix: "turns",
    }),
    csv: `${Papa.unparse({ fields: header, data: rows })}\r\n`,
  };
}
