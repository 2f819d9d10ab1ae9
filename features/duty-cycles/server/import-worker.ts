// The worker process's loop; started by scripts/worker.ts and by the integration tests.
import PgBoss from "pg-boss";
import { Client } from "pg";
import type { Db } from "@/db/client";
import {
  IMPORT_JOB_OPTIONS,
  IMPORT_QUEUE,
  IMPORT_WAKE_CHANNEL,
  type TImportJob,
} from "@/features/duty-cycles/server/import-queue";
import { runImport } from "@/features/duty-cycles/server/run-import";
import { warmUpImport } from "@/features/duty-cycles/server/warm-up-import";

/**
 * Works import jobs one at a time per worker (an import is CPU-bound; run more workers, on
 * other machines if need be, for more throughput). Returns a stop function.
 */
export async function startImportWorker({
  db,
  connectionString,
  log = console.log,
}: {
  db: Db;
  connectionString: string;
  log?: (message: string) => void;
}): Promise<{ stop: () => Promise<void>; boss: PgBoss }> {
  await warmUpImport();
  const boss = new PgBoss({ connectionString, max: 3 });
  boss.on("error", (e) => console.error("[worker]", e));
  await boss.start();
  await boss.createQueue(IMPORT_QUEUE, { name: IMPORT_QUEUE, ...IMPORT_JOB_OPTIONS });
  const workerId = await boss.work<TImportJob>(
    IMPORT_QUEUE,
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
  return {
    boss,
    stop: async () => {
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
