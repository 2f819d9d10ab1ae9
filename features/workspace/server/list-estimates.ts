import "server-only";
import { and, asc, desc, eq, ilike, or, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TEstimateListQuery, TPage } from "@/features/workspace/schemas/list-query";
import type { TEstimateRow } from "@/features/workspace/schemas/estimate";
import { customerScope } from "@/features/workspace/server/authorize";
import { likePattern, pageTotal, toPage, totalColumn } from "@/features/workspace/server/paging";
import { toEstimateRow } from "@/features/workspace/server/estimate-dto";

const sortColumns = {
  createdAt: estimates.createdAt,
  title: estimates.title,
  machineName: estimates.machineName,
  costPerHour: estimates.costPerHour,
  hoursToFirstReplacement: estimates.hoursToFirstReplacement,
} as const;

/** Lists estimates without their (large) result documents. */
export async function listEstimates({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: TEstimateListQuery;
}): Promise<TPage<TEstimateRow>> {
  const filters: SQL[] = [eq(estimates.dealershipId, actor.dealershipId)];
  const scope = customerScope(actor);
  if (scope) filters.push(eq(estimates.customerId, scope));
  if (query.customerId) filters.push(eq(estimates.customerId, query.customerId));
  if (query.machineId) filters.push(eq(estimates.machineId, query.machineId));
  if (query.q) {
    const pattern = likePattern(query.q);
    filters.push(or(ilike(estimates.title, pattern), ilike(estimates.machineName, pattern))!);
  }
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const rows = await db
    .select({
      id: estimates.id,
      title: estimates.title,
      customerId: estimates.customerId,
      customerName: customers.name,
      machineId: estimates.machineId,
      machineName: estimates.machineName,
      dutyCycleName: estimates.dutyCycleName,
      costPerHour: estimates.costPerHour,
      hoursToFirstReplacement: estimates.hoursToFirstReplacement,
      firstToWear: estimates.firstToWear,
      warningCount: estimates.warningCount,
      createdAt: estimates.createdAt,
      total: totalColumn(estimates, where),
    })
    .from(estimates)
    .leftJoin(customers, eq(customers.id, estimates.customerId))
    .where(where)
    // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
    .orderBy(order(sortColumns[query.sort]), order(estimates.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = await pageTotal(rows, () =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(estimates)
      .where(where),
  );
  return toPage(
    rows.map((r) => toEstimateRow(r, r.customerName)),
    total,
    query.page,
    query.pageSize,
  );
}
