// The worker process's loop; started by scripts/worker.ts and by the integration tests.
import PgBoss from "pg-boss";
import { Client } from "pg";
import type { Db } from "@/db/client";
import {
  IMPORT_JOB_OPTIONS,
  IMPORT_LIVENESS,
  importQueue,
  IMPORT_WAKE_CHANNEL,
  type TImportJob,
} from "@/features/duty-cycles/server/import-queue";
import { runImport } from "@/features/duty-cycles/server/run-import";
import { warmUpImport } from "@/features/duty-cycles/server/warm-up-import";
import { recoverStalledImports } from "@/features/duty-cycles/server/recover-stalled-imports";

/**
 * Works import jobs one at a time per worker (an import is CPU-bound; run more workers, on
 * other machines if need be, for more throughput). Every worker also watches for imports whose
 * worker died (a stale heartbeat) and queues them again. Returns a stop function.
 */
export async function startImportWorker({
  db,
  connectionString,
  log = console.log,
  liveness = IMPORT_LIVENESS,
}: {
  db: Db;
  connectionString: string;
  log?: (message: string) => void;
  /** How soon a dead worker's import is taken back (tests shorten it). */
  liveness?: { staleAfterSeconds: number; checkSeconds: number };
}): Promise<{ stop: () => Promise<void>; boss: PgBoss }> {
  await warmUpImport();
  const boss = new PgBoss({ connectionString, max: 3 });
  boss.on("error", (e) => console.error("[worker]", e));
  await boss.start();
  await boss.createQueue(importQueue(), { name: importQueue(), ...IMPORT_JOB_OPTIONS });
  const workerId = await boss.work<TImportJob>(
    importQueue(),
    { batchSize: 1, pollingIntervalSeconds: 0.5 },
    async ([job]) => {
      if (!job) return;
      const started = Date.now();
      let detail = "";
      const outcome = await runImport({
        db,
        dutyCycleId: job.data.dutyCycleId,
        onTimings: (t) => {
          detail = ` (file ${t.parseMs.toFixed(0)} ms, store ${t.storeMs.toFixed(0)} ms)`;
        },
      });
      log(
        `[worker] duty cycle ${job.data.dutyCycleId}: ${outcome} in ${Date.now() - started} ms${detail}`,
      );
    },
  );
  const wake = await listenForNewJobs(connectionString, () => boss.notifyWorker(workerId));
  const recover = async () => {
    try {
      const found = await recoverStalledImports({
        db,
        boss,
        staleAfterSeconds: liveness.staleAfterSeconds,
      });
      for (const r of found)
        log(
          `[worker] duty cycle ${r.dutyCycleId}: its worker stopped mid-import; ${r.outcome === "retrying" ? "queued again" : "retry limit reached, marked failed"}`,
        );
    } catch (e) {
      console.error("[worker] checking for stalled imports:", e instanceof Error ? e.message : e);
    }
  };
  await recover();
  const watchdog = setInterval(() => void recover(), liveness.checkSeconds * 1000);
  return {
    boss,
    stop: async () => {
      clearInterval(watchdog);
      await wake.end().catch(() => undefined);
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
    },
  };
}

/**
 * Wakes the worker when a job is queued (LISTEN on the channel enqueueImport notifies), so an
 * import starts at once rather than at the next poll. Polling stays on as the fallback.
 */
async function listenForNewJobs(connectionString: string, wake: () => void): Promise<Client> {
  const client = new Client({ connectionString });
  client.on("error", (e) => console.error("[worker] wake-up connection:", e.message));
  client.on("notification", (n) => {
    if (n.channel === IMPORT_WAKE_CHANNEL) wake();
  });
  await client.connect();
  await client.query(`listen ${IMPORT_WAKE_CHANNEL}`);
  return client;
}
