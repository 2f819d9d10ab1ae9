import "server-only";
import { sql, type SQL } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import type { TPage } from "@/features/workspace/schemas/list-query";

export function toPage<T>(items: T[], total: number, page: number, pageSize: number): TPage<T> {
  return { items, page, pageSize, total, pageCount: Math.max(1, Math.ceil(total / pageSize)) };
}

/** Escapes LIKE wildcards so a user's "50%" searches for the text "50%". */
export function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export const iso = (d: Date) => d.toISOString();

/**
 * The filtered row count as a column of the page query (an InitPlan Postgres runs once), so a
 * page costs one round trip instead of two.
 */
export const totalColumn = (table: PgTable, where: SQL | undefined) =>
  sql<number>`(select count(*)::int from ${table} where ${where})`;

/** The total from the page's first row; past the last page there is no row, so count apart. */
export async function pageTotal(rows: { total: number }[], count: () => Promise<{ n: number }[]>) {
  if (rows[0]) return rows[0].total;
  const [r] = await count();
  return r?.n ?? 0;
}
