import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZMachineListQuery } from "@/features/machines/schemas/machine-list-query";
import { parseOrThrow } from "@/features/platform/server/api-error";
import { queryOf, readJson, respond } from "@/features/platform/server/respond";
import { listMachines } from "@/features/machines/server/list-machines";
import { createMachine } from "@/features/machines/server/create-machine";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listMachines({ db: getDb(), actor, query: parseOrThrow(ZMachineListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createMachine({ db: getDb(), actor, input: await readJson(req) }), 201),
);
