import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { getStudy } from "@/features/options/server/get-study";
import { pathId, respond } from "@/features/platform";
import { toComparisonDto } from "@/features/options/server/study-dto";

export const dynamic = "force-dynamic";

export const GET = withActor(({ actor, params }) =>
  respond(async () =>
    toComparisonDto(
      await getStudy({
        db: getDb(),
        actor,
        kind: "comparison",
        id: pathId(params.id, "comparison"),
      }),
    ),
  ),
);
