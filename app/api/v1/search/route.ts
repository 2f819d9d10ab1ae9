import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZSearchQuery } from "@/features/search/schemas/search";
import { parseOrThrow } from "@/features/platform/server/api-error";
import { queryOf, respond } from "@/features/platform/server/respond";
import { searchWorkspace } from "@/features/search/server/search-workspace";

/** Global search across customers and machines. */
export const GET = withActor(({ req, actor }) =>
  respond(() =>
    searchWorkspace({ db: getDb(), actor, query: parseOrThrow(ZSearchQuery, queryOf(req)) }),
  ),
);
