import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage, TSiteListQuery } from "@/features/workspace/schemas/list-query";
import type { TSiteDto } from "@/features/workspace/schemas/site";
import { customerScope } from "@/features/workspace/server/authorize";
import { likePattern, pageTotal, toPage, totalColumn } from "@/features/workspace/server/paging";
import { toSiteDto } from "@/features/workspace/server/site-dto";

const sortColumns = { name: sites.name, updatedAt: sites.updatedAt } as const;

export async function listSites({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: TSiteListQuery;
}): Promise<TPage<TSiteDto>> {
  const filters: SQL[] = [eq(sites.dealershipId, actor.dealershipId)];
  const scope = customerScope(actor);
  if (scope) filters.push(eq(sites.customerId, scope));
  if (query.customerId) filters.push(eq(sites.customerId, query.customerId));
  if (query.q) filters.push(ilike(sites.name, likePattern(query.q)));
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const rows = await db
    .select({ site: sites, customerName: customers.name, total: totalColumn(sites, where) })
    .from(sites)
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(where)
    // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
    .orderBy(order(sortColumns[query.sort]), order(sites.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = await pageTotal(rows, () =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(sites)
      .where(where),
  );
  return toPage(
    rows.map((r) => toSiteDto(r.site, r.customerName)),
    total,
    query.page,
    query.pageSize,
  );
}
