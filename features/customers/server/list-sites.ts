import "server-only";
import { and, asc, desc, eq, ilike, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, sites } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TPage } from "@/lib/query/list-query";
import type { TSiteListQuery } from "@/features/customers/schemas/customer-list-query";
import type { TSiteDto } from "@/features/customers/schemas/site";
import { assertMayRead, customerScope } from "@/features/platform";
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
import { toSiteDto } from "@/features/customers/server/site-dto";

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
  const params: Record<string, unknown> = {
    dealershipId: actor.dealershipId,
    ...pageWindow(query.page, query.pageSize),
  };
  const filters: SQL[] = [eq(sites.dealershipId, bind("dealershipId"))];
  assertMayRead(actor, "site");
  const scope = customerScope(actor);
  if (scope) {
    filters.push(eq(sites.customerId, bind("scope")));
    params.scope = scope;
  }
  if (query.customerId) {
    filters.push(eq(sites.customerId, bind("customerId")));
    params.customerId = query.customerId;
  }
  if (query.q) {
    filters.push(ilike(sites.name, bind("q")));
    params.q = likePattern(query.q);
  }
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const shape = `sites:${query.sort}:${query.dir}:${shapeFlags(params)}`;
  const rows = await preparedShape(db, shape, (name) =>
    db
      .select({ site: sites, customerName: customers.name, total: totalColumn(sites, where) })
      .from(sites)
      .innerJoin(customers, eq(customers.id, sites.customerId))
      .where(where)
      // The id breaks ties in the same direction, so one index (…, column, id) serves the whole order.
      .orderBy(order(sortColumns[query.sort]), order(sites.id))
      .limit(bind("limit"))
      .offset(bind("offset"))
      .prepare(name),
  ).execute(params);
  const total = await pageTotal({ db, rows, shape, table: sites, where, params });
  return toPage(
    rows.map((r) => toSiteDto(r.site, r.customerName)),
    total,
    query.page,
    query.pageSize,
  );
}
