import "server-only";
import { and, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { optionStudies } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can, readScope } from "@/lib/authz/policy";
import {
  ZStudyListQuery,
  type TStudyKind,
  type TStudyPage,
  type TStudyRow,
} from "../schemas/study";
import { likePattern, notFound, parseOrThrow, toPage } from "@/features/platform";
import { toStudyRow } from "./study-dto";

/**
 * Newest first, narrowed to a machine, customer, estimate or series and by title text; a customer sees
 * only their own.
 */
export async function listStudies({
  db,
  actor,
  kind,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  kind: TStudyKind;
  query: unknown;
}): Promise<TStudyPage<TStudyRow>> {
  if (!can(actor, "estimate:read")) throw notFound(kind);
  const q = parseOrThrow(ZStudyListQuery, query);
  const scope = readScope(actor);
  const filters: (SQL | undefined)[] = [
    eq(optionStudies.dealershipId, actor.dealershipId),
    eq(optionStudies.kind, kind),
    scope.customerId ? eq(optionStudies.customerId, scope.customerId) : undefined,
    q.machineId ? eq(optionStudies.machineId, q.machineId) : undefined,
    q.customerId ? eq(optionStudies.customerId, q.customerId) : undefined,
    q.estimateId ? eq(optionStudies.estimateId, q.estimateId) : undefined,
    q.seriesId ? eq(optionStudies.seriesId, q.seriesId) : undefined,
    q.q ? ilike(optionStudies.title, likePattern(q.q)) : undefined,
  ];
  const where = and(...filters);
  const [rows, [count]] = await Promise.all([
    db
      .select()
      .from(optionStudies)
      .where(where)
      .orderBy(desc(optionStudies.createdAt), desc(optionStudies.id))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(optionStudies)
      .where(where),
  ]);
  return toPage(rows.map(toStudyRow), count?.n ?? 0, q.page, q.pageSize);
}
