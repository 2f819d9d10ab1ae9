import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZSiteListQuery } from "@/features/customers/schemas/customer-list-query";
import { parseOrThrow } from "@/features/platform/server/api-error";
import { queryOf, readJson, respond } from "@/features/platform/server/respond";
import { listSites } from "@/features/customers/server/list-sites";
import { createSite } from "@/features/customers/server/create-site";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listSites({ db: getDb(), actor, query: parseOrThrow(ZSiteListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createSite({ db: getDb(), actor, input: await readJson(req) }), 201),
);
