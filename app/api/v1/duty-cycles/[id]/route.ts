import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { idParam, readJsonBody, respond } from "@/features/duty-cycles/server/respond";
import { getDutyCycle } from "@/features/duty-cycles/server/get-duty-cycle";
import { updateDutyCycle } from "@/features/duty-cycles/server/update-duty-cycle";
import { deleteDutyCycle } from "@/features/duty-cycles/server/delete-duty-cycle";

export const dynamic = "force-dynamic";

export const GET = withActor(({ actor, params }) =>
  respond(() => getDutyCycle({ db: getDb(), actor, id: idParam(params.id, "duty cycle") })),
);

export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateDutyCycle({
      db: getDb(),
      actor,
      id: idParam(params.id, "duty cycle"),
      input: await readJsonBody(req),
    }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteDutyCycle({
      db: getDb(),
      actor,
      id: idParam(params.id, "duty cycle"),
      confirmed: new URL(req.url).searchParams.get("confirm") === "true",
    }),
  ),
);
