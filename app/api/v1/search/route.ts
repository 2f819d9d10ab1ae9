import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZSearchQuery } from "@/features/workspace/schemas/list-query";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { queryOf, respond } from "@/features/workspace/server/respond";
import { searchWorkspace } from "@/features/workspace/server/search-workspace";

/** Global search across customers and machines. */
export const GET = withActor(({ req, actor }) =>
  respond(() =>
    searchWorkspace({ db: getDb(), actor, query: parseOrThrow(ZSearchQuery, queryOf(req)) }),
  ),
);
