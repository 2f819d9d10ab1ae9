import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZEstimateListQuery } from "@/features/estimates/schemas/estimate-list-query";
import { parseOrThrow } from "@/features/platform/server/api-error";
import { queryOf, readJson, respond } from "@/features/platform/server/respond";
import { listEstimates } from "@/features/estimates/server/list-estimates";
import { createEstimate } from "@/features/estimates/server/create-estimate";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listEstimates({ db: getDb(), actor, query: parseOrThrow(ZEstimateListQuery, queryOf(req)) }),
  ),
);

/** Runs the engine and stores the estimate. */
export const POST = withActor(({ req, actor }) =>
  respond(async () => createEstimate({ db: getDb(), actor, input: await readJson(req) }), 201),
);
