import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { confirmed, pathId, readJson, respond } from "@/features/platform/server/respond";
import { getEstimate } from "@/features/estimates/server/get-estimate";
import { deleteEstimate } from "@/features/estimates/server/delete-estimate";
import { updateEstimate } from "@/features/estimates/server/update-estimate";

export const GET = withActor(({ actor, params }) =>
  respond(() => getEstimate({ db: getDb(), actor, id: pathId(params.id, "estimate") })),
);

/** Renames the estimate (the only thing about it that can change). */
export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateEstimate({
      db: getDb(),
      actor,
      id: pathId(params.id, "estimate"),
      input: await readJson(req),
    }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteEstimate({
      db: getDb(),
      actor,
      id: pathId(params.id, "estimate"),
      confirm: confirmed(req),
    }),
  ),
);
