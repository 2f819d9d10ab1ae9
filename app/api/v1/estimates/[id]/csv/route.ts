import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/platform/server/respond";
import { exportEstimateCsv } from "@/features/estimates/server/export-estimate-csv";

/** Per-turn CSV download of a stored estimate. */
export const GET = withActor(async ({ actor, params }) => {
  let file: { fileName: string; csv: string } | undefined;
  const refusal = await respond(async () => {
    file = await exportEstimateCsv({ db: getDb(), actor, id: pathId(params.id, "estimate") });
    return null;
  });
  if (!file) return refusal;
  return new Response(file.csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${file.fileName}"`,
      "cache-control": "no-store",
    },
  });
});
