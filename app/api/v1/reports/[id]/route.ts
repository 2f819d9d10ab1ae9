import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/platform";
import { getReport } from "@/features/reports/server/get-report";
import { updateReport } from "@/features/reports/server/update-report";

export const GET = withActor(({ actor, params }) =>
  respond(() => getReport({ db: getDb(), actor, id: pathId(params.id, "report") })),
);

/** Edits the draft (title, recommendations, note); issued versions stay as issued. */
export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateReport({
      db: getDb(),
      actor,
      id: pathId(params.id, "report"),
      input: await readJson(req),
    }),
  ),
);
