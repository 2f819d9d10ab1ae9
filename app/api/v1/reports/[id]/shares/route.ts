import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { pathId, readJson, respond } from "@/features/platform";
import { getMailer } from "@/features/auth/server/mailer";
import { shareReport } from "@/features/reports/server/share-report";
import { withdrawReportShare } from "@/features/reports/server/withdraw-report-share";

/** Shares the issued report with its customer (account, or an invitation to the contact). */
export const POST = withActor(({ req, actor, params }) =>
  respond(async () =>
    shareReport({
      db: getDb(),
      mailer: getMailer(),
      actor,
      id: pathId(params.id, "report"),
      input: await readJson(req),
    }),
  ),
);

/** Withdraws the report from the customer. */
export const DELETE = withActor(({ actor, params }) =>
  respond(() => withdrawReportShare({ db: getDb(), actor, id: pathId(params.id, "report") })),
);
