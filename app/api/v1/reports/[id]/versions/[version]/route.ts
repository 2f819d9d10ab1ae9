import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/platform";
import { getReportVersion, versionParam } from "@/features/reports/server/get-report-version";

/** One issued version as frozen ("latest" for the newest). */
export const GET = withActor(({ actor, params }) =>
  respond(() =>
    getReportVersion({
      db: getDb(),
      actor,
      id: pathId(params.id, "report"),
      version: versionParam(params.version),
    }),
  ),
);
