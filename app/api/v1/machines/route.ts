import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZMachineListQuery } from "@/features/workspace/schemas/list-query";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { queryOf, readJson, respond } from "@/features/workspace/server/respond";
import { listMachines } from "@/features/workspace/server/list-machines";
import { createMachine } from "@/features/workspace/server/create-machine";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listMachines({ db: getDb(), actor, query: parseOrThrow(ZMachineListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createMachine({ db: getDb(), actor, input: await readJson(req) }), 201),
);
