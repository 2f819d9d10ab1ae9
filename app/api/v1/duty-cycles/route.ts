import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { readJsonBody, respond, searchParamsOf } from "@/features/duty-cycles/server/respond";
import { listDutyCycles } from "@/features/duty-cycles/server/list-duty-cycles";
import { createDutyCycle } from "@/features/duty-cycles/server/create-duty-cycle";

export const dynamic = "force-dynamic";

export const GET = withActor(({ req, actor }) =>
  respond(() => listDutyCycles({ db: getDb(), actor, query: searchParamsOf(req) })),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createDutyCycle({ db: getDb(), actor, input: await readJsonBody(req) }), 201),
);
