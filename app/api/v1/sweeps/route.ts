import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { createStudy } from "@/features/options/server/create-study";
import { listStudies } from "@/features/options/server/list-studies";
import { queryOf, readJson, respond } from "@/features/platform";
import { toSweepDto } from "@/features/options/server/study-dto";

export const dynamic = "force-dynamic";

/** Stored sweeps, newest first (?machineId, ?customerId, ?estimateId, ?page, ?pageSize). */
export const GET = withActor(({ req, actor }) =>
  respond(() => listStudies({ db: getDb(), actor, kind: "sweep", query: queryOf(req) })),
);

/** Runs the engine on an estimate's frozen inputs and stores the sweep. */
export const POST = withActor(({ req, actor }) =>
  respond(
    async () =>
      toSweepDto(
        await createStudy({ db: getDb(), actor, kind: "sweep", input: await readJson(req) }),
      ),
    201,
  ),
);
