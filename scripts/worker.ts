// Background worker: processes duty-cycle imports and billing events from the PostgreSQL-backed queue (pg-boss).
// Run as many as needed, on any machine that reaches the database and the upload folder.
import { getDb, getPool } from "@/db/client";
import { getEnv } from "@/lib/env";
import { startImportWorker } from "@/features/duty-cycles/server/import-worker";
import { startBillingWorker } from "@/features/billing/server/billing-worker";
import { billingProvider } from "@/features/billing/server/stripe";
import { getMailer } from "@/features/auth/server/mailer";

const worker = await startImportWorker({ db: getDb(), connectionString: getEnv().DATABASE_URL });
const billing = await startBillingWorker({
  deps: { db: getDb(), provider: billingProvider(), mailer: getMailer() },
  connectionString: getEnv().DATABASE_URL,
});
console.log("[worker] waiting for duty-cycle imports and billing events");

async function shutdown(signal: string) {
  console.log(`[worker] ${signal}: finishing the current job, then stopping`);
  await Promise.all([worker.stop(), billing.stop()]);
  await getPool().end();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
