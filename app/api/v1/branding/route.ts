import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { readJson, respond } from "@/features/platform";
import { getBranding } from "@/features/reports/server/get-branding";
import { updateBranding } from "@/features/reports/server/update-branding";

export const GET = withActor(({ actor }) => respond(() => getBranding({ db: getDb(), actor })));

/** The dealer admin sets the report name, contact line and currency. */
export const PUT = withActor(({ req, actor }) =>
  respond(async () => updateBranding({ db: getDb(), actor, input: await readJson(req) })),
);
