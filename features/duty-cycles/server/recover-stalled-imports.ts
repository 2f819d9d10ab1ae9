// Runs in the worker process (scripts/worker.ts), so no "server-only" marker.
import { and, eq, lt, sql } from "drizzle-orm";
import type PgBoss from "pg-boss";
import type { Db } from "@/db/client";
import { dutyCycles } from "@/db/schema";
import {
  IMPORT_JOB_OPTIONS,
  IMPORT_LIVENESS,
  importQueue,
  type TImportJob,
} from "@/features/duty-cycles/server/import-queue";

export type TRecoveredImport = { dutyCycleId: string; outcome: "retrying" | "failed" };

/**
 * Finds imports whose worker stopped renewing the heartbeat (killed, out of memory, machine
 * gone) and hands them back to the queue at once instead of waiting for the job's expiry. Safe
 * to run from every worker at the same time: taking a cycle over is one conditional UPDATE, so
 * exactly one of them wins it. The interrupted attempt stored nothing (an import writes all its
 * rows in one transaction at the end), so the retry starts clean.
 */
export async function recoverStalledImports({
  db,
  boss,
  staleAfterSeconds = IMPORT_LIVENESS.staleAfterSeconds,
}: {
  db: Db;
  boss: PgBoss;
  staleAfterSeconds?: number;
}): Promise<TRecoveredImport[]> {
  const cutoff = sql`now() - make_interval(secs => ${staleAfterSeconds})`;
  const stalled = await db
    .update(dutyCycles)
    .set({
      status: "pending",
      progress: 0,
      heartbeatAt: null,
      interruptions: sql`${dutyCycles.interruptions} + 1`,
      updatedAt: new Date(),
    })
    .where(
      and(
        eq(dutyCycles.status, "processing"),
        lt(sql`coalesce(${dutyCycles.heartbeatAt}, ${dutyCycles.processingStartedAt})`, cutoff),
      ),
    )
    .returning({ id: dutyCycles.id, jobId: dutyCycles.jobId });

  const recovered: TRecoveredImport[] = [];
  for (const cycle of stalled) {
    const outcome = await requeue(db, boss, cycle.id, cycle.jobId);
    recovered.push({ dutyCycleId: cycle.id, outcome });
  }
  return recovered;
}

/** Fails the dead attempt's job so pg-boss retries it (or gives up after its retry limit). */
async function requeue(
  db: Db,
  boss: PgBoss,
  dutyCycleId: string,
  jobId: string | null,
): Promise<TRecoveredImport["outcome"]> {
  if (jobId) {
    await boss.fail(importQueue(), jobId, { message: "the worker running it stopped" });
    const job = await boss.getJobById(importQueue(), jobId);
    if (job?.state === "failed") {
      await db
        .update(dutyCycles)
        .set({
          status: "failed",
          failureReason:
            "The worker processing this file stopped several times (it may be running out of memory). Retry; if it stops again, split the file or ask your administrator.",
          updatedAt: new Date(),
        })
        .where(and(eq(dutyCycles.id, dutyCycleId), eq(dutyCycles.status, "pending")));
      return "failed";
    }
    if (job && ["created", "retry", "active"].includes(job.state)) return "retrying";
  }
  // No live job behind the cycle (none recorded, or already archived): queue a fresh one.
  const id = await boss.send(
    importQueue(),
    { dutyCycleId } satisfies TImportJob,
    IMPORT_JOB_OPTIONS,
  );
  await db.update(dutyCycles).set({ jobId: id }).where(eq(dutyCycles.id, dutyCycleId));
  return "retrying";
}
