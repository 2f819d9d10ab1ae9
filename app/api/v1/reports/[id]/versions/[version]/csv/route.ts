import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/platform";
import { versionParam } from "@/features/reports/server/get-report-version";
import { exportReportCsv } from "@/features/reports/server/export-report-csv";
import { attachment } from "@/features/reports/server/attachment";

/** The per-turn CSV annex of one issued version. */
export const GET = withActor(async ({ actor, params }) => {
  let file: { fileName: string; csv: string } | undefined;
  const refusal = await respond(async () => {
    file = await exportReportCsv({
      db: getDb(),
      actor,
      id: pathId(params.id, "report"),
      version: versionParam(params.version),
    });
    return null;
  });
  if (!file) return refusal;
  return attachment(file.csv, "text/csv; charset=utf-8", file.fileName);
});
