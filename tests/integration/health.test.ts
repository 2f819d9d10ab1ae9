import { afterAll, describe, expect, it } from "vitest";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { getDb } from "@/db/client";
import { getHealth } from "@/features/platform/server/get-health";
import { GET } from "@/app/api/health/route";

describe("health", () => {
  const deadPool = new Pool({
    connectionString: "postgres://postgres@127.0.0.1:1/none",
    connectionTimeoutMillis: 500,
  });
  afterAll(async () => {
    await deadPool.end();
  });

  it("reports the real database up through the route handler", async () => {
    const res = await GET();
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ status: "ok", database: "up" });
  });

  it("reports down when the database cannot be reached", async () => {
    const health = await getHealth({
      db: drizzle(deadPool) as unknown as ReturnType<typeof getDb>,
      version: "test",
    });
    expect(health).toMatchObject({ status: "degraded", database: "down", latencyMs: null });
  });
});
