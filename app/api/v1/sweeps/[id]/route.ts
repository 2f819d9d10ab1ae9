import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { getStudy } from "@/features/options/server/get-study";
import { pathId, respond } from "@/features/platform";
import { toSweepDto } from "@/features/options/server/study-dto";

export const dynamic = "force-dynamic";

export const GET = withActor(({ actor, params }) =>
  respond(async () =>
    toSweepDto(
      await getStudy({ db: getDb(), actor, kind: "sweep", id: pathId(params.id, "sweep") }),
    ),
  ),
);
