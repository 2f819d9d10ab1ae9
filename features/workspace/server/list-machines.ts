import "server-only";
import { and, asc, desc, eq, ilike, isNotNull, isNull, or, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates, machines } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TMachineListQuery, TPage } from "@/features/workspace/schemas/list-query";
import type { TMachineRow } from "@/features/workspace/schemas/machine";
import { customerScope } from "@/features/workspace/server/authorize";
import {
  iso,
  likePattern,
  pageTotal,
  toPage,
  totalColumn,
} from "@/features/workspace/server/paging";

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
  const filters: SQL[] = [eq(machines.dealershipId, actor.dealershipId)];
  const scope = customerScope(actor);
  if (scope) filters.push(eq(machines.customerId, scope));
  if (query.customerId) filters.push(eq(machines.customerId, query.customerId));
  if (query.layout) filters.push(eq(machines.layout, query.layout));
  if (query.template === "true") filters.push(isNull(machines.customerId));
  if (query.template === "false") filters.push(isNotNull(machines.customerId));
  if (query.q) {
    const pattern = likePattern(query.q);
    filters.push(or(ilike(machines.name, pattern), ilike(machines.kind, pattern))!);
  }
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const rows = await db
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
    .from(machines)
    .leftJoin(customers, eq(customers.id, machines.customerId))
    .where(where)
    // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
    .orderBy(order(sortColumns[query.sort]), order(machines.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = await pageTotal(rows, () =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(machines)
      .where(where),
  );
  return toPage(
    rows.map(({ total: _total, ...r }) => ({ ...r, updatedAt: iso(r.updatedAt) })),
    total,
    query.page,
    query.pageSize,
  );
}
