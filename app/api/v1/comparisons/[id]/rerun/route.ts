import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { rerunStudy } from "@/features/options/server/rerun-study";
import { pathId, respond } from "@/features/platform";
import { toComparisonDto } from "@/features/options/server/study-dto";

export const dynamic = "force-dynamic";

/** Reruns the frozen inputs with today's engine as the next version. */
export const POST = withActor(({ actor, params }) =>
  respond(
    async () =>
      toComparisonDto(
        await rerunStudy({
          db: getDb(),
          actor,
          kind: "comparison",
          id: pathId(params.id, "comparison"),
        }),
      ),
    201,
  ),
);
