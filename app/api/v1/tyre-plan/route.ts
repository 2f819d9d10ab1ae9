import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { queryOf, respond } from "@/features/calibration/server/respond";
import { getTyrePlan } from "@/features/calibration/server/get-tyre-plan";

/** `?customerId=&months=`: the dealership's plan, one customer's, or a customer account's own. */
export const GET = withActor(({ req, actor }) =>
  respond(() => getTyrePlan({ db: getDb(), actor, query: queryOf(req) })),
);
