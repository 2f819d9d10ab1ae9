// Background worker: processes duty-cycle imports from the PostgreSQL-backed queue (pg-boss).
// Run as many as needed, on any machine that reaches the database and the upload folder.
import { getDb, getPool } from "@/db/client";
import { getEnv } from "@/lib/env";
import { startImportWorker } from "@/features/duty-cycles/server/import-worker";

const worker = await startImportWorker({ db: getDb(), connectionString: getEnv().DATABASE_URL });
console.log("[worker] waiting for duty-cycle imports");

async function shutdown(signal: string) {
  console.log(`[worker] ${signal}: finishing the current job, then stopping`);
  await worker.stop();
  await getPool().end();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
