import "server-only";
import { and, asc, desc, eq, ilike, or, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage } from "@/lib/query/list-query";
import type { TEstimateListQuery } from "@/features/estimates/schemas/estimate-list-query";
import type { TEstimateRow } from "@/features/estimates/schemas/estimate";
import { customerScope } from "@/features/platform";
import {
  bind,
  likePattern,
  pageTotal,
  pageWindow,
  preparedShape,
  shapeFlags,
  toPage,
  totalColumn,
} from "@/features/platform";
import { toEstimateRow } from "@/features/estimates/server/estimate-dto";

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
  const params: Record<string, unknown> = {
    dealershipId: actor.dealershipId,
    ...pageWindow(query.page, query.pageSize),
  };
  const filters: SQL[] = [eq(estimates.dealershipId, bind("dealershipId"))];
  const scope = customerScope(actor);
  if (scope) {
    filters.push(eq(estimates.customerId, bind("scope")));
    params.scope = scope;
  }
  if (query.customerId) {
    filters.push(eq(estimates.customerId, bind("customerId")));
    params.customerId = query.customerId;
  }
  if (query.machineId) {
    filters.push(eq(estimates.machineId, bind("machineId")));
    params.machineId = query.machineId;
  }
  if (query.q) {
    filters.push(or(ilike(estimates.title, bind("q")), ilike(estimates.machineName, bind("q")))!);
    params.q = likePattern(query.q);
  }
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const shape = `estimates:${query.sort}:${query.dir}:${shapeFlags(params)}`;
  // Deferred join: the page's ids first (the index alone walks past the skipped rows), then
  // the columns and the customer's name for those rows only, so deep pages stay cheap.
  const pageIds = () =>
    db
      .select({ id: estimates.id })
      .from(estimates)
      .where(where)
      // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
      .orderBy(order(sortColumns[query.sort]), order(estimates.id))
      .limit(bind("limit"))
      .offset(bind("offset"))
      .as("page_ids");
  const rows = await preparedShape(db, shape, (name) => {
    const page = pageIds();
    return db
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
      .from(page)
      .innerJoin(estimates, eq(estimates.id, page.id))
      .leftJoin(customers, eq(customers.id, estimates.customerId))
      .orderBy(order(sortColumns[query.sort]), order(estimates.id))
      .prepare(name);
  }).execute(params);
  const total = await pageTotal({ db, rows, shape, table: estimates, where, params });
  return toPage(
    rows.map((r) => toEstimateRow(r, r.customerName)),
    total,
    query.page,
    query.pageSize,
  );
}
