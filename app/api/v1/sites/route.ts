import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZSiteListQuery } from "@/features/workspace/schemas/list-query";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { queryOf, readJson, respond } from "@/features/workspace/server/respond";
import { listSites } from "@/features/workspace/server/list-sites";
import { createSite } from "@/features/workspace/server/create-site";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listSites({ db: getDb(), actor, query: parseOrThrow(ZSiteListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createSite({ db: getDb(), actor, input: await readJson(req) }), 201),
);
