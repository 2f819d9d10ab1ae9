import { afterAll, describe, expect, it } from "vitest";
import { getDb, getPool } from "@/db/client";
import { hitRateLimit, isRateLimited } from "@/features/auth/server/rate-limit";
import { uniqueTag } from "@/tests/support/session";

const db = getDb();
afterAll(async () => {
  await getPool().end();
});

describe("rate limit counters in PostgreSQL", () => {
  it("allows `limit` hits per window, then refuses until the next window", async () => {
    const key = `test:${uniqueTag()}`;
    const now = new Date("2026-03-01T10:07:00Z");
    const results = [];
    for (let i = 0; i < 4; i++)
      results.push(await hitRateLimit(db, { key, limit: 3, windowSeconds: 900, now }));
    expect(results.map((r) => r.allowed)).toEqual([true, true, true, false]);
    // 10:07 falls in the 10:00–10:15 window: 8 minutes left.
    expect(results[3]!.retryAfterSeconds).toBe(480);
    const next = await hitRateLimit(db, {
      key,
      limit: 3,
      windowSeconds: 900,
      now: new Date("2026-03-01T10:15:00Z"),
    });
    expect(next).toMatchObject({ allowed: true, hits: 1 });
  });

  it("counts concurrent hits exactly (no lost updates across connections)", async () => {
    const key = `test:${uniqueTag()}`;
    const now = new Date();
    const results = await Promise.all(
      Array.from({ length: 20 }, () => hitRateLimit(db, { key, limit: 5, windowSeconds: 60, now })),
    );
    expect(results.map((r) => r.hits).sort((a, b) => a - b)).toEqual(
      Array.from({ length: 20 }, (_, i) => i + 1),
    );
    expect(results.filter((r) => r.allowed)).toHaveLength(5);
  });

  it("isRateLimited reads the count without adding to it", async () => {
    const key = `test:${uniqueTag()}`;
    const opts = { key, limit: 2, windowSeconds: 900 };
    expect(await isRateLimited(db, opts)).toBe(false);
    expect(await isRateLimited(db, opts)).toBe(false);
    await hitRateLimit(db, opts);
    expect(await isRateLimited(db, opts)).toBe(false);
    await hitRateLimit(db, opts);
    expect(await isRateLimited(db, opts)).toBe(true);
  });
});
