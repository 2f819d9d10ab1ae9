import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { readJsonBody, respond, searchParamsOf } from "@/features/duty-cycles/server/respond";
import { listMappingTemplates } from "@/features/duty-cycles/server/list-mapping-templates";
import { createMappingTemplate } from "@/features/duty-cycles/server/create-mapping-template";

export const dynamic = "force-dynamic";

export const GET = withActor(({ req, actor }) =>
  respond(() => listMappingTemplates({ db: getDb(), actor, query: searchParamsOf(req) })),
);

export const POST = withActor(({ req, actor }) =>
  respond(
    async () => createMappingTemplate({ db: getDb(), actor, input: await readJsonBody(req) }),
    201,
  ),
);
