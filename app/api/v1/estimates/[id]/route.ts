import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { confirmed, pathId, respond } from "@/features/workspace/server/respond";
import { getEstimate } from "@/features/workspace/server/get-estimate";
import { deleteEstimate } from "@/features/workspace/server/delete-estimate";

export const GET = withActor(({ actor, params }) =>
  respond(() => getEstimate({ db: getDb(), actor, id: pathId(params.id, "estimate") })),
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
