import "server-only";
import { and, asc, desc, eq, ilike, isNotNull, isNull, or, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage } from "@/lib/query/list-query";
import type { TMachineListQuery } from "@/features/machines/schemas/machine-list-query";
import type { TMachineRow } from "@/features/machines/schemas/machine";
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
  name: machines.name,
  kind: machines.kind,
  layout: machines.layout,
  updatedAt: machines.updatedAt,
  customerName: customers.name,
} as const;

export async function listMachines({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: TMachineListQuery;
}): Promise<TPage<TMachineRow>> {
  const params: Record<string, unknown> = {
    dealershipId: actor.dealershipId,
    ...pageWindow(query.page, query.pageSize),
  };
  const filters: SQL[] = [eq(machines.dealershipId, bind("dealershipId"))];
  assertMayRead(actor, "machine");
  const scope = customerScope(actor);
  if (scope) {
    filters.push(eq(machines.customerId, bind("scope")));
    params.scope = scope;
  }
  if (query.customerId) {
    filters.push(eq(machines.customerId, bind("customerId")));
    params.customerId = query.customerId;
  }
  if (query.layout) {
    filters.push(eq(machines.layout, bind("layout")));
    params.layout = query.layout;
  }
  if (query.q) {
    filters.push(or(ilike(machines.name, bind("q")), ilike(machines.kind, bind("q")))!);
    params.q = likePattern(query.q);
  }
  // No value to bind: the template filter is part of the shape's name.
  if (query.template === "true") filters.push(isNull(machines.customerId));
  if (query.template === "false") filters.push(isNotNull(machines.customerId));
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const shape = `machines:${query.sort}:${query.dir}:${query.template ?? "-"}:${shapeFlags(params)}`;
  // Deferred join: the page's ids first, then the columns, the customer's name and the estimate
  // count for those rows only, so deep pages stay cheap. The customer join stays in the id query
  // because the list can sort by the customer's name.
  const pageIds = () =>
    db
      .select({ id: machines.id })
      .from(machines)
      .leftJoin(customers, eq(customers.id, machines.customerId))
      .where(where)
      // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
      .orderBy(order(sortColumns[query.sort]), order(machines.id))
      .limit(bind("limit"))
      .offset(bind("offset"))
      .as("page_ids");
  const rows = await preparedShape(db, shape, (name) => {
    const page = pageIds();
    return db
      .select({
        id: machines.id,
        customerId: machines.customerId,
        customerName: customers.name,
        name: machines.name,
        kind: machines.kind,
        layout: machines.layout,
        version: machines.version,
        updatedAt: machines.updatedAt,
        estimateCount: sql<number>`(select count(*)::int from ${estimates} where ${estimates.machineId} = ${machines.id})`,
        total: totalColumn(machines, where),
      })
      .from(page)
      .innerJoin(machines, eq(machines.id, page.id))
      .leftJoin(customers, eq(customers.id, machines.customerId))
      .orderBy(order(sortColumns[query.sort]), order(machines.id))
      .prepare(name);
  }).execute(params);
  const total = await pageTotal({ db, rows, shape, table: machines, where, params });
  return toPage(
    rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: iso(r.updatedAt) })),
    total,
    query.page,
    query.pageSize,
  );
}
