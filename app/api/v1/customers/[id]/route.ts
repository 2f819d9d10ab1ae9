import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { confirmed, pathId, readJson, respond } from "@/features/platform/server/respond";
import { getCustomer } from "@/features/customers/server/get-customer";
import { updateCustomer } from "@/features/customers/server/update-customer";
import { deleteCustomer } from "@/features/customers/server/delete-customer";

export const GET = withActor(({ actor, params }) =>
  respond(() => getCustomer({ db: getDb(), actor, id: pathId(params.id, "customer") })),
);

export const PATCH = withActor(({ req, actor, params }) =>
  respond(async () =>
    updateCustomer({
      db: getDb(),
      actor,
      id: pathId(params.id, "customer"),
      input: await readJson(req),
    }),
  ),
);

export const DELETE = withActor(({ req, actor, params }) =>
  respond(() =>
    deleteCustomer({
      db: getDb(),
      actor,
      id: pathId(params.id, "customer"),
      confirm: confirmed(req),
    }),
  ),
);
