import "server-only";
import { sql } from "drizzle-orm";
import type { Db } from "@/db/client";

export type THealth = {
  status: "ok" | "degraded";
  version: string;
  database: "up" | "down";
  latencyMs: number | null;
};

/** Checks the database with a trivial query, bounded by a short timeout. */
export async function getHealth({
  db,
  version,
  timeoutMs = 2000,
}: {
  db: Db;
  version: string;
  timeoutMs?: number;
}): Promise<THealth> {
  const started = performance.now();
  try {
    await Promise.race([
      db.execute(sql`select 1`),
      new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), timeoutMs)),
    ]);
    return {
      status: "ok",
      version,
      database: "up",
      latencyMs: Math.round(performance.now() - started),
    };
  } catch {
    return { status: "degraded", version, database: "down", latencyMs: null };
  }
}
