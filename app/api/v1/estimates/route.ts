import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZEstimateListQuery } from "@/features/workspace/schemas/list-query";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { queryOf, readJson, respond } from "@/features/workspace/server/respond";
import { listEstimates } from "@/features/workspace/server/list-estimates";
import { createEstimate } from "@/features/workspace/server/create-estimate";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listEstimates({ db: getDb(), actor, query: parseOrThrow(ZEstimateListQuery, queryOf(req)) }),
  ),
);

/** Runs the engine and stores the estimate. */
export const POST = withActor(({ req, actor }) =>
  respond(async () => createEstimate({ db: getDb(), actor, input: await readJson(req) }), 201),
);
