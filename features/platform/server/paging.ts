import "server-only";
import { createHash } from "node:crypto";
import { sql, type SQL } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import type { DbOrTx } from "@/db/client";
import type { TPage } from "@/lib/query/list-query";

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

/**
 * The total from the page's first row; past the last page there is no row, so count apart with
 * the list's own filter (a prepared statement of its own, named after the list's shape).
 */
export async function pageTotal({
  db,
  rows,
  shape,
  table,
  where,
  params,
}: {
  db: DbOrTx;
  rows: { total: number }[];
  shape: string;
  table: PgTable;
  where: SQL | undefined;
  params: Record<string, unknown>;
}): Promise<number> {
  if (rows[0]) return rows[0].total;
  const [r] = await preparedShape(db, `${shape}:count`, (name) =>
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(table)
      .where(where)
      .prepare(name),
  ).execute(params);
  return r?.n ?? 0;
}

// Prepared list statements per database handle, one per query shape (sort, direction and which
// filters are present); values go in as placeholders, so the shapes are few and bounded.
const statements = new WeakMap<object, Map<string, unknown>>();

/**
 * The prepared statement for one list shape, built on first use. It skips rebuilding the SQL in
 * JS on every request, and Postgres plans it once per connection. `shape` names the shape in
 * full; the statement's name in Postgres is a hash of it, as identifiers stop at 63 characters.
 */
export function preparedShape<P>(db: object, shape: string, build: (name: string) => P): P {
  let byShape = statements.get(db);
  if (!byShape) statements.set(db, (byShape = new Map()));
  let statement = byShape.get(shape) as P | undefined;
  if (!statement) {
    statement = build(`tc_list_${createHash("sha1").update(shape).digest("hex").slice(0, 24)}`);
    byShape.set(shape, statement);
  }
  return statement;
}

/** Limit and offset of a page, as placeholder values. */
export const pageWindow = (page: number, pageSize: number) => ({
  limit: pageSize,
  offset: (page - 1) * pageSize,
});

/** A placeholder to bind a filter value at execution. */
export const bind = (name: string) => sql.placeholder(name);

/** Which optional filters a list request binds, as a short stable part of a statement name. */
export function shapeFlags(params: Record<string, unknown>): string {
  return Object.keys(params)
    .filter((k) => !["dealershipId", "limit", "offset"].includes(k))
    .sort()
    .join(",");
}
