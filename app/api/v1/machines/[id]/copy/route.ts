import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/platform/server/respond";
import { copyMachineTemplate } from "@/features/machines/server/copy-machine-template";

/** Copies a template (or any machine) to a customer. */
export const POST = withActor(({ req, actor, params }) =>
  respond(
    async () =>
      copyMachineTemplate({
        db: getDb(),
        actor,
        id: pathId(params.id, "machine"),
        input: await readJson(req),
      }),
    201,
  ),
);
