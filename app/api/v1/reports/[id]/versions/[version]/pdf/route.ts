import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/platform";
import { versionParam } from "@/features/reports/server/get-report-version";
import { exportReportPdf } from "@/features/reports/server/export-report-pdf";
import { attachment } from "@/features/reports/server/attachment";

export const GET = withActor(async ({ actor, params }) => {
  let file: { fileName: string; pdf: Buffer } | undefined;
  const refusal = await respond(async () => {
    file = await exportReportPdf({
      db: getDb(),
      actor,
      id: pathId(params.id, "report"),
      version: versionParam(params.version),
    });
    return null;
  });
  if (!file) return refusal;
  return attachment(new Uint8Array(file.pdf), "application/pdf", file.fileName);
});
