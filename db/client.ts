import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { getEnv } from "@/lib/env";
import * as schema from "@/db/schema";

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle is accepted anywhere a Db is. */
export type DbOrTx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];

// One pool per process, kept across hot reloads in development.
const globalForDb = globalThis as unknown as { treadcastPool?: Pool; treadcastDb?: Db };

export function getPool(): Pool {
  if (!globalForDb.treadcastPool) {
    globalForDb.treadcastPool = new Pool({
      connectionString: getEnv().DATABASE_URL,
      max: 10,
      connectionTimeoutMillis: 3000,
    });
  }
  return globalForDb.treadcastPool;
}

export function getDb(): Db {
  if (!globalForDb.treadcastDb) {
    globalForDb.treadcastDb = drizzle(getPool(), { schema, casing: "snake_case" });
  }
  return globalForDb.treadcastDb;
}
