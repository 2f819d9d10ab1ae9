import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, machines, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TCustomerListQuery, TPage } from "@/features/workspace/schemas/list-query";
import type { TCustomerRow } from "@/features/workspace/schemas/customer";
import { customerScope } from "@/features/workspace/server/authorize";
import {
  likePattern,
  pageTotal,
  toPage,
  totalColumn,
  iso,
} from "@/features/workspace/server/paging";

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
  const filters: SQL[] = [eq(customers.dealershipId, actor.dealershipId)];
  const scope = customerScope(actor);
  if (scope) filters.push(eq(customers.id, scope));
  if (query.q) filters.push(ilike(customers.name, likePattern(query.q)));
  if (query.kind) filters.push(eq(customers.kind, query.kind));
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;

  const rows = await db
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
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = await pageTotal(rows, () =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(customers)
      .where(where),
  );
  return toPage(
    rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: iso(r.updatedAt) })),
    total,
    query.page,
    query.pageSize,
  );
}
