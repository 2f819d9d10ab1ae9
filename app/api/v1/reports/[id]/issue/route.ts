import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, respond } from "@/features/platform";
import { issueReport } from "@/features/reports/server/issue-report";

/** Issues the next immutable version (402 when the dealership's report allowance refuses). */
export const POST = withActor(({ actor, params }) =>
  respond(() => issueReport({ db: getDb(), actor, id: pathId(params.id, "report") }), 201),
);
