import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, dutyCycles } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, readScope } from "@/lib/authz/policy";
import {
  ZDutyCycleListQuery,
  type TDutyCycleRow,
  type TPage,
} from "@/features/duty-cycles/schemas/duty-cycle";
import { forbiddenError, parseInput } from "@/features/duty-cycles/server/errors";
import { toDutyCycleRow } from "@/features/duty-cycles/server/duty-cycle-dto";

const sortColumns = {
  createdAt: dutyCycles.createdAt,
  name: dutyCycles.name,
  status: dutyCycles.status,
  operatingHours: dutyCycles.operatingHours,
} as const;

/** One page of the dealership's duty cycles (a customer account sees only its own). */
export async function listDutyCycles({
  db,
  actor,
  query: rawQuery,
}: {
  db: DbOrTx;
  actor: TActor;
  query: unknown;
}): Promise<TPage<TDutyCycleRow>> {
  if (!can(actor, "duty-cycle:read")) throw forbiddenError("duty cycles");
  const query = parseInput(ZDutyCycleListQuery, rawQuery);
  const scope = readScope(actor);
  const filters: SQL[] = [eq(dutyCycles.dealershipId, scope.dealershipId)];
  if (scope.customerId) filters.push(eq(dutyCycles.customerId, scope.customerId));
  if (query.customerId) filters.push(eq(dutyCycles.customerId, query.customerId));
  if (query.status) filters.push(eq(dutyCycles.status, query.status));
  if (query.source) filters.push(eq(dutyCycles.source, query.source));
  if (query.q)
    filters.push(ilike(dutyCycles.name, `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`));
  const where = and(...filters);
  const order = query.dir === "desc" ? desc : asc;
  const [rows, [count]] = await Promise.all([
    db
      .select({ cycle: dutyCycles, customerName: customers.name })
      .from(dutyCycles)
      .innerJoin(customers, eq(customers.id, dutyCycles.customerId))
      .where(where)
      .orderBy(order(sortColumns[query.sort]), asc(dutyCycles.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(dutyCycles)
      .where(where),
  ]);
  const total = count?.n ?? 0;
  return {
    items: rows.map((r) => toDutyCycleRow(r.cycle, r.customerName)),
    page: query.page,
    pageSize: query.pageSize,
    total,
    pageCount: Math.max(1, Math.ceil(total / query.pageSize)),
  };
}
