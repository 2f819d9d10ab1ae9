import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { confirmed, pathId, readJson, respond } from "@/features/platform/server/respond";
import { getSite } from "@/features/customers/server/get-site";
import { updateSite } from "@/features/customers/server/update-site";
import { deleteSite } from "@/features/customers/server/delete-site";

export const GET = withActor(({ actor, params }) =>
  respond(() => getSite({ db: getDb(), actor, id: pathId(params.id, "site") })),
);

export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateSite({ db: getDb(), actor, id: pathId(params.id, "site"), input: await readJson(req) }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteSite({ db: getDb(), actor, id: pathId(params.id, "site"), confirm: confirmed(req) }),
  ),
);
