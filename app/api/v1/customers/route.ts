import { getDb } from "@/db/client";
import { withActor } from "@/app/api/_lib/with-actor";
import { ZCustomerListQuery } from "@/features/customers/schemas/customer-list-query";
import { parseOrThrow } from "@/features/platform/server/api-error";
import { queryOf, readJson, respond } from "@/features/platform/server/respond";
import { listCustomers } from "@/features/customers/server/list-customers";
import { createCustomer } from "@/features/customers/server/create-customer";

export const GET = withActor(({ req, actor }) =>
  respond(() =>
    listCustomers({ db: getDb(), actor, query: parseOrThrow(ZCustomerListQuery, queryOf(req)) }),
  ),
);

export const POST = withActor(({ req, actor }) =>
  respond(async () => createCustomer({ db: getDb(), actor, input: await readJson(req) }), 201),
);
