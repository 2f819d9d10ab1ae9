import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { idParam, readJsonBody, respond } from "@/features/duty-cycles/server/respond";
import { getMappingTemplate } from "@/features/duty-cycles/server/get-mapping-template";
import { updateMappingTemplate } from "@/features/duty-cycles/server/update-mapping-template";
import { deleteMappingTemplate } from "@/features/duty-cycles/server/delete-mapping-template";

export const dynamic = "force-dynamic";

export const GET = withActor(({ actor, params }) =>
  respond(() =>
    getMappingTemplate({ db: getDb(), actor, id: idParam(params.id, "mapping template") }),
  ),
);

export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateMappingTemplate({
      db: getDb(),
      actor,
      id: idParam(params.id, "mapping template"),
      input: await readJsonBody(req),
    }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteMappingTemplate({
      db: getDb(),
      actor,
      id: idParam(params.id, "mapping template"),
      confirmed: new URL(req.url).searchParams.get("confirm") === "true",
    }),
  ),
);
