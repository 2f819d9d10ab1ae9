import "server-only";
import type { QueryClient } from "@tanstack/react-query";
import { getDb } from "@/db/client";
import type { TActor } from "@/lib/authz/actor";
import { listParams, type TListState } from "@/lib/query/list-state";
import { found } from "@/features/platform";
import { ZCustomerListQuery } from "@/features/customers/schemas/customer-list-query";
import { customerKeys } from "@/features/customers/api/customers";
import { listCustomers } from "@/features/customers/server/list-customers";
import { getCustomer } from "@/features/customers/server/get-customer";

// Fill the page's query cache on the server with exactly what the client hooks would fetch (same
// keys), so the first paint has the data and the client does not fetch it again.

export const prefetchCustomerList = async (qc: QueryClient, actor: TActor, state: TListState) =>
  qc.setQueryData(
    customerKeys.list(state),
    await listCustomers({
      db: getDb(),
      actor,
      query: ZCustomerListQuery.parse({ ...listParams(state), q: state.q || undefined }),
    }),
  );

/** False when the record is not there for this actor (the page shows a 404). */
export const prefetchCustomer = async (qc: QueryClient, actor: TActor, id: string) =>
  found(async () =>
    qc.setQueryData(customerKeys.detail(id), await getCustomer({ db: getDb(), actor, id })),
  );
