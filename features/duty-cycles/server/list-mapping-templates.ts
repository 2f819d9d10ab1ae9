import "server-only";
import { and, asc, desc, eq, ilike, sql, type SQL } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { mappingTemplates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZMappingTemplateListQuery } from "@/features/duty-cycles/schemas/mapping-template";
import { parseInput } from "@/features/duty-cycles/server/errors";
import { toMappingTemplate } from "@/features/duty-cycles/server/mapping-template-dto";
import { requireTemplateRead } from "@/features/duty-cycles/server/mapping-template-access";

export async function listMappingTemplates({
  db,
  actor,
  query,
}: {
  db: DbOrTx;
  actor: TActor;
  query: unknown;
}) {
  requireTemplateRead(actor);
  const q = parseInput(ZMappingTemplateListQuery, query);
  const filters: SQL[] = [eq(mappingTemplates.dealershipId, actor.dealershipId)];
  if (q.kind) filters.push(eq(mappingTemplates.kind, q.kind));
  if (q.q)
    filters.push(ilike(mappingTemplates.name, `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`));
  const where = and(...filters);
  const order = q.dir === "desc" ? desc : asc;
  const [rows, [count]] = await Promise.all([
    db
      .select()
      .from(mappingTemplates)
      .where(where)
      .orderBy(
        order(q.sort === "name" ? mappingTemplates.name : mappingTemplates.updatedAt),
        asc(mappingTemplates.id),
      )
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(mappingTemplates)
      .where(where),
  ]);
  const total = count?.n ?? 0;
  return {
    items: rows.map(toMappingTemplate),
    page: q.page,
    pageSize: q.pageSize,
    total,
    pageCount: Math.max(1, Math.ceil(total / q.pageSize)),
  };
}
