// Shared by the app (sends jobs) and the worker process (works them), so no "server-only" marker.
import PgBoss from "pg-boss";
import { getEnv } from "@/lib/env";

/** The queue's name (IMPORT_QUEUE, "duty-cycle-import" unless set). */
export const importQueue = () => getEnv().IMPORT_QUEUE;
/** PostgreSQL NOTIFY channel that wakes idle workers as soon as a job is queued. */
export const IMPORT_WAKE_CHANNEL = "treadcast_duty_cycle_import";

export type TImportJob = { dutyCycleId: string };

/** Retries for failures that are not the file's fault (database restarts, a killed worker). */
export const IMPORT_JOB_OPTIONS = {
  retryLimit: 3,
  // First retry after 2–4 s, then 4–8 s, 8–16 s (pg-boss's randomised backoff).
  retryDelay: 2,
  retryBackoff: true,
  // The last resort for a job nobody renews. A dead worker is normally found much sooner, by its
  // import's stale heartbeat (IMPORT_LIVENESS), so this only has to outlast the largest import.
  expireInSeconds: 15 * 60,
} as const;

/**
 * Liveness of a running import: its worker renews duty_cycles.heartbeat_at every
 * `heartbeatSeconds`; every worker checks every `checkSeconds` for imports whose heartbeat is
 * older than `staleAfterSeconds` and hands them back to the queue. Five missed beats leaves room
 * for a busy machine (garbage collection, a starved CPU) without calling a live worker dead.
 */
export const IMPORT_LIVENESS = {
  heartbeatSeconds: 2,
  staleAfterSeconds: 10,
  checkSeconds: 3,
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
    await boss.createQueue(importQueue(), { name: importQueue(), ...IMPORT_JOB_OPTIONS });
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
    importQueue(),
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
