import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage } from "@/lib/query/list-query";
import type { TCustomerListQuery } from "@/features/customers/schemas/customer-list-query";
import type { TCustomerRow } from "@/features/customers/schemas/customer";
import { assertMayRead, customerScope } from "@/features/platform";
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
  assertMayRead(actor, "customer");
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

  // Deferred join: the page's ids first (the index alone walks past the skipped rows), then the
  // columns and counts for those rows only. The join also makes Drizzle qualify every column, so
  // the count subqueries compare machines.customerId with customers.id (in a one-table select
  // both rendered as bare names and matched the machine's own id: every count read 0).
  const pageIds = () =>
    db
      .select({ id: customers.id })
      .from(customers)
      .where(where)
      // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
      .orderBy(order(sortColumns[query.sort]), order(customers.id))
      .limit(bind("limit"))
      .offset(bind("offset"))
      .as("page_ids");
  const rows = await preparedShape(db, shape, (name) => {
    const page = pageIds();
    return db
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
      .from(page)
      .innerJoin(customers, eq(customers.id, page.id))
      .orderBy(order(sortColumns[query.sort]), order(customers.id))
      .prepare(name);
  }).execute(params);
  const total = await pageTotal({ db, rows, shape, table: customers, where, params });
  return toPage(
    rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: iso(r.updatedAt) })),
    total,
    query.page,
    query.pageSize,
  );
}
