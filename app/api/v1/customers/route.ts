import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZCustomerListQuery } from "@/features/workspace/schemas/list-query";
import { parseOrThrow } from "@/features/workspace/server/errors";
import { queryOf, readJson, respond } from "@/features/workspace/server/respond";
import { listCustomers } from "@/features/workspace/server/list-customers";
import { createCustomer } from "@/features/workspace/server/create-customer";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listCustomers({ db: getDb(), actor, query: parseOrThrow(ZCustomerListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createCustomer({ db: getDb(), actor, input: await readJson(req) }), 201),
);
