// Applies the committed drizzle migrations to DATABASE_URL.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { getDb, getPool } from "@/db/client";

await migrate(getDb(), { migrationsFolder: "./drizzle" });
await getPool().end();
