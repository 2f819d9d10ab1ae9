// Shared by the app (sends jobs) and the worker process (works them), so no "server-only" marker.
import PgBoss from "pg-boss";
import { getEnv } from "@/lib/env";

export const IMPORT_QUEUE = "duty-cycle-import";
/** PostgreSQL NOTIFY channel that wakes idle workers as soon as a job is queued. */
export const IMPORT_WAKE_CHANNEL = "treadcast_duty_cycle_import";

export type TImportJob = { dutyCycleId: string };

/** Retries for failures that are not the file's fault (database restarts, a killed worker). */
export const IMPORT_JOB_OPTIONS = {
  retryLimit: 3,
  retryDelay: 5,
  retryBackoff: true,
  // A worker that dies mid-job releases it after this long; the next attempt starts over.
  expireInSeconds: 15 * 60,
} as const;

const globalForQueue = globalThis as unknown as { treadcastSender?: Promise<PgBoss> };

/** A pg-boss client that only sends (the app process): no maintenance, a small pool. */
export function getImportSender(): Promise<PgBoss> {
  globalForQueue.treadcastSender ??= (async () => {
    const boss = new PgBoss({
      connectionString: getEnv().DATABASE_URL,
      max: 2,
      supervise: false,
      schedule: false,
    });
    boss.on("error", (e) => console.error("[queue]", e));
    await boss.start();
    await boss.createQueue(IMPORT_QUEUE, { name: IMPORT_QUEUE, ...IMPORT_JOB_OPTIONS });
    return boss;
  })().catch((e) => {
    globalForQueue.treadcastSender = undefined;
    throw e;
  });
  return globalForQueue.treadcastSender;
}

/** Queues the import of one duty cycle; returns the job id. */
export async function enqueueImport(dutyCycleId: string): Promise<string> {
  const boss = await getImportSender();
  const id = await boss.send(
    IMPORT_QUEUE,
    { dutyCycleId } satisfies TImportJob,
    IMPORT_JOB_OPTIONS,
  );
  if (!id) throw new Error("The import queue did not accept the job.");
  // Workers poll as well, so a lost notification only delays the job by one polling interval.
  await boss
    .getDb()
    .executeSql("select pg_notify($1, '')", [IMPORT_WAKE_CHANNEL])
    .catch(() => undefined);
  return id;
}
