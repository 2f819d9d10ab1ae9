import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { confirmed, pathId, readJson, respond } from "@/features/platform/server/respond";
import { getMachine } from "@/features/machines/server/get-machine";
import { updateMachine } from "@/features/machines/server/update-machine";
import { deleteMachine } from "@/features/machines/server/delete-machine";

export const GET = withActor(({ actor, params }) =>
  respond(() => getMachine({ db: getDb(), actor, id: pathId(params.id, "machine") })),
);

export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateMachine({
      db: getDb(),
      actor,
      id: pathId(params.id, "machine"),
      input: await readJson(req),
    }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteMachine({
      db: getDb(),
      actor,
      id: pathId(params.id, "machine"),
      confirm: confirmed(req),
    }),
  ),
);
