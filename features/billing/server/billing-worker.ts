// The worker's billing loop; started by scripts/worker.ts and by the integration tests.
import PgBoss from "pg-boss";
import {
  UPKEEP_QUEUE,
  WEBHOOK_JOB_OPTIONS,
  WEBHOOK_QUEUE,
  type TWebhookJob,
} from "@/features/billing/server/billing-queue";
import { processWebhookEvent } from "@/features/billing/server/process-event";
import type { TBillingDeps } from "@/features/billing/server/deps";
import { billOverage, mailEndingTrials, strandedEvents } from "@/features/billing/server/upkeep";

export async function startBillingWorker({
  deps,
  connectionString,
  log = console.log,
}: {
  deps: TBillingDeps;
  connectionString: string;
  log?: (message: string) => void;
}): Promise<{ stop: () => Promise<void>; boss: PgBoss }> {
  const boss = new PgBoss({ connectionString, max: 3 });
  boss.on("error", (e) => console.error("[billing worker]", e));
  await boss.start();
  await boss.createQueue(WEBHOOK_QUEUE, { name: WEBHOOK_QUEUE, ...WEBHOOK_JOB_OPTIONS });
  await boss.createQueue(UPKEEP_QUEUE, { name: UPKEEP_QUEUE, retryLimit: 2 });
  await boss.work<TWebhookJob>(
    WEBHOOK_QUEUE,
    { batchSize: 4, pollingIntervalSeconds: 0.5 },
    async (jobs) => {
      for (const job of jobs) {
        const outcome = await processWebhookEvent(deps, job.data.eventId);
        log(`[worker] billing event ${job.data.eventId}: ${outcome}`);
      }
    },
  );
  await boss.work(UPKEEP_QUEUE, { pollingIntervalSeconds: 5 }, async () => {
    const mailed = await mailEndingTrials(deps);
    const billed = await billOverage(deps);
    const stranded = await strandedEvents(deps.db);
    for (const eventId of stranded)
      await boss.send(WEBHOOK_QUEUE, { eventId }, WEBHOOK_JOB_OPTIONS);
    if (mailed || billed || stranded.length)
      log(
        `[worker] billing upkeep: ${mailed} trial mails, ${billed} overage charges, ${stranded.length} events re-queued`,
      );
  });
  await boss.schedule(UPKEEP_QUEUE, "7 * * * *");
  await boss.send(UPKEEP_QUEUE, {});
  return {
    boss,
    stop: () => boss.stop({ graceful: true, wait: true, timeout: 10_000 }),
  };
}
