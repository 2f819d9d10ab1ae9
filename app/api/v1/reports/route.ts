import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { queryOf, readJson, respond } from "@/features/platform";
import { createReport } from "@/features/reports/server/create-report";
import { listReports } from "@/features/reports/server/list-reports";

export const GET = withActor(({ req, actor }) =>
  respond(() => listReports({ db: getDb(), actor, query: queryOf(req) })),
);

/** Starts a draft report from an estimate. */
export const POST = withActor(({ req, actor }) =>
  respond(async () => createReport({ db: getDb(), actor, input: await readJson(req) }), 201),
);
