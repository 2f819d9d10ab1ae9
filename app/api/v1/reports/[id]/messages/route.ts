import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/platform";
import { getMailer } from "@/features/auth/server/mailer";
import { listReportMessages } from "@/features/reports/server/list-report-messages";
import { postReportMessage } from "@/features/reports/server/post-report-message";

export const GET = withActor(({ actor, params }) =>
  respond(() => listReportMessages({ db: getDb(), actor, id: pathId(params.id, "report") })),
);

/** A question from the customer or a reply from the dealership; e-mailed to the other side. */
export const POST = withActor(({ req, actor, params }) =>
  respond(
    async () =>
      postReportMessage({
        db: getDb(),
        mailer: getMailer(),
        actor,
        id: pathId(params.id, "report"),
        input: await readJson(req),
      }),
    201,
  ),
);
