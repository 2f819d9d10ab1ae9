import "server-only";
import { and, eq, lt, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { rateLimitCounters } from "@/db/schema";

export type TRateLimitResult = { allowed: boolean; hits: number; retryAfterSeconds: number };

/**
 * Counts one attempt against `key` in a fixed window and says whether it is within `limit`.
 * Held in PostgreSQL so the count is shared by every app instance.
 */
export async function hitRateLimit(
  db: DbOrTx,
  opts: { key: string; limit: number; windowSeconds: number; now?: Date },
): Promise<TRateLimitResult> {
  const nowMs = (opts.now ?? new Date()).getTime();
  const windowMs = opts.windowSeconds * 1000;
  const windowStart = new Date(Math.floor(nowMs / windowMs) * windowMs);
  const [row] = await db
    .insert(rateLimitCounters)
    .values({ key: opts.key, windowStart, hits: 1 })
    .onConflictDoUpdate({
      target: [rateLimitCounters.key, rateLimitCounters.windowStart],
      set: { hits: sql`${rateLimitCounters.hits} + 1` },
    })
    .returning({ hits: rateLimitCounters.hits });
  // Old windows are useless; prune now and then rather than on every hit.
  if (Math.random() < 0.02) {
    await db
      .delete(rateLimitCounters)
      .where(lt(rateLimitCounters.windowStart, new Date(nowMs - 24 * 3600 * 1000)));
  }
  const hits = row?.hits ?? 1;
  return {
    allowed: hits <= opts.limit,
    hits,
    retryAfterSeconds: Math.ceil((windowStart.getTime() + windowMs - nowMs) / 1000),
  };
}

/** Whether `key` has already used up `limit` in the current window, without counting a hit. */
export async function isRateLimited(
  db: DbOrTx,
  opts: { key: string; limit: number; windowSeconds: number; now?: Date },
): Promise<boolean> {
  const nowMs = (opts.now ?? new Date()).getTime();
  const windowMs = opts.windowSeconds * 1000;
  const windowStart = new Date(Math.floor(nowMs / windowMs) * windowMs);
  const [row] = await db
    .select({ hits: rateLimitCounters.hits })
    .from(rateLimitCounters)
    .where(
      and(eq(rateLimitCounters.key, opts.key), eq(rateLimitCounters.windowStart, windowStart)),
    );
  return (row?.hits ?? 0) >= opts.limit;
}
