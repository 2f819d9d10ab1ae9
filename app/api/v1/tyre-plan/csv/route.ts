import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { queryOf, respond } from "@/features/calibration/server/respond";
import { exportTyrePlanCsv } from "@/features/calibration/server/export-tyre-plan-csv";

export const GET = withActor(async ({ req, actor }) => {
  let csv: string | undefined;
  const refusal = await respond(async () => {
    csv = await exportTyrePlanCsv({ db: getDb(), actor, query: queryOf(req) });
    return null;
  });
  if (csv === undefined) return refusal;
  return new Response(csv, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="tyre-plan-${new Date().toISOString().slice(0, 10)}.csv"`,
      "cache-control": "no-store",
    },
  });
});
