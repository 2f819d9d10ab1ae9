import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { idParam, respond } from "@/features/duty-cycles/server/respond";
import { retryDutyCycleImport } from "@/features/duty-cycles/server/retry-duty-cycle-import";

export const dynamic = "force-dynamic";

export const POST = withActor(({ actor, params }) =>
  respond(
    () => retryDutyCycleImport({ db: getDb(), actor, id: idParam(params.id, "duty cycle") }),
    202,
  ),
);
