import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { idParam, respond } from "@/features/duty-cycles/server/respond";
import { exportBadRowsCsv } from "@/features/duty-cycles/server/export-bad-rows-csv";

export const dynamic = "force-dynamic";

export const GET = withActor(({ actor, params }) =>
  respond(async () => {
    const { fileName, csv } = await exportBadRowsCsv({
      db: getDb(),
      actor,
      id: idParam(params.id, "duty cycle"),
    });
    return new Response(csv, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${fileName}"`,
        "cache-control": "no-store",
      },
    });
  }),
);
