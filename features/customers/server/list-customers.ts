import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage } from "@/lib/query/list-query";
import type { TCustomerListQuery } from "@/features/customers/schemas/customer-list-query";
import type { TCustomerRow } from "@/features/customers/schemas/customer";
import { customerScope } from "@/features/platform";
import {
  bind,
  iso,
  likePattern,
  pageTotal,
  pageWindow,
  preparedShape,
  shapeFlags,
  toPage,
  totalColumn,
} from "@/features/platform";

const sortColumns = {
  name: customers.name,
  kind: customers.kind,
  updatedAt: customers.updatedAt,
  createdAt: customers.createdAt,
} as const;

export async function listCustomers({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: TCustomerListQuery;
}): Promise<TPage<TCustomerRow>> {
  const params: Record<string, unknown> = {
    dealershipId: actor.dealershipId,
    ...pageWindow(query.page, query.pageSize),
  };
  const filters: SQL[] = [eq(customers.dealershipId, bind("dealershipId"))];
  const scope = customerScope(actor);
  if (scope) {
    filters.push(eq(customers.id, bind("scope")));
    params.scope = scope;
  }
  if (query.q) {
    filters.push(ilike(customers.name, bind("q")));
    params.q = likePattern(query.q);
  }
  if (query.kind) {
    filters.push(eq(customers.kind, bind("kind")));
    params.kind = query.kind;
  }
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const shape = `customers:${query.sort}:${query.dir}:${shapeFlags(params)}`;

  const rows = await preparedShape(db, shape, (name) =>
    db
      .select({
        id: customers.id,
        name: customers.name,
        kind: customers.kind,
        contactName: customers.contactName,
        updatedAt: customers.updatedAt,
        machineCount: sql<number>`(select count(*)::int from ${machines} where ${machines.customerId} = ${customers.id})`,
        siteCount: sql<number>`(select count(*)::int from ${sites} where ${sites.customerId} = ${customers.id})`,
        total: totalColumn(customers, where),
      })
      .from(customers)
      .where(where)
      // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
      .orderBy(order(sortColumns[query.sort]), order(customers.id))
      .limit(bind("limit"))
      .offset(bind("offset"))
      .prepare(name),
  ).execute(params);
  const total = await pageTotal({ db, rows, shape, table: customers, where, params });
  return toPage(
    rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: iso(r.updatedAt) })),
    total,
    query.page,
    query.pageSize,
  );
}
