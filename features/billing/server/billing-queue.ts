// Shared by the app (sends jobs) and the worker (works them), so no "server-only" marker.
import PgBoss from "pg-boss";
import { getEnv } from "@/lib/env";

/** Webhook events accepted by the route, worked in the background. */
export const WEBHOOK_QUEUE = "billing-webhook";
/** Hourly upkeep: trial-ending mails, overage charges, missed events. */
export const UPKEEP_QUEUE = "billing-upkeep";

export type TWebhookJob = { eventId: string };

export const WEBHOOK_JOB_OPTIONS = {
  retryLimit: 8,
  retryDelay: 2,
  retryBackoff: true,
  expireInSeconds: 5 * 60,
} as const;

const globalForQueue = globalThis as unknown as { treadcastBillingSender?: Promise<PgBoss> };

/** A send-only pg-boss client for the app process. */
export function getBillingSender(): Promise<PgBoss> {
  globalForQueue.treadcastBillingSender ??= (async () => {
    const boss = new PgBoss({
      connectionString: getEnv().DATABASE_URL,
      max: 4,
      supervise: false,
      schedule: false,
    });
    boss.on("error", (e) => console.error("[billing queue]", e));
    await boss.start();
    await boss.createQueue(WEBHOOK_QUEUE, { name: WEBHOOK_QUEUE, ...WEBHOOK_JOB_OPTIONS });
    return boss;
  })().catch((e) => {
    globalForQueue.treadcastBillingSender = undefined;
    throw e;
  });
  return globalForQueue.treadcastBillingSender;
}

/** Queues one accepted event; the webhook's unique event row means this runs once per event. */
export async function enqueueWebhookEvent(eventId: string): Promise<void> {
  const boss = await getBillingSender();
  const id = await boss.send(WEBHOOK_QUEUE, { eventId } satisfies TWebhookJob, WEBHOOK_JOB_OPTIONS);
  if (!id) throw new Error("The billing queue did not accept the event.");
}
