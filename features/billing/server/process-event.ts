// Works one accepted webhook event (in the worker). No "server-only" marker.
import { eq } from "drizzle-orm";
import { billingWebhookEvents } from "@/db/schema";
import type { TBillingDeps } from "@/features/billing/server/deps";
import { syncCheckoutSession, syncInvoice, syncSubscription } from "@/features/billing/server/sync";

/** Events that change what we store; the rest are recorded and left alone. */
export const HANDLED_EVENTS = [
  "checkout.session.completed",
  "customer.subscription.created",
  "customer.subscription.updated",
  "customer.subscription.deleted",
  "invoice.paid",
  "invoice.payment_failed",
] as const;

export async function processWebhookEvent(
  deps: TBillingDeps,
  eventId: string,
): Promise<"processed" | "ignored" | "missing"> {
  const { db } = deps;
  const [event] = await db
    .select()
    .from(billingWebhookEvents)
    .where(eq(billingWebhookEvents.eventId, eventId));
  if (!event) return "missing";
  const objectId = event.objectId;
  let outcome: "processed" | "ignored" = "processed";
  try {
    if (!objectId) outcome = "ignored";
    else if (event.type === "checkout.session.completed") await syncCheckoutSession(deps, objectId);
    else if (event.type.startsWith("customer.subscription."))
      await syncSubscription(deps, objectId);
    else if (event.type === "invoice.paid" || event.type === "invoice.payment_failed")
      await syncInvoice(deps, objectId);
    else outcome = "ignored";
  } catch (error) {
    await db
      .update(billingWebhookEvents)
      .set({ error: String((error as Error).message ?? error).slice(0, 500) })
      .where(eq(billingWebhookEvents.eventId, eventId));
    throw error;
  }
  await db
    .update(billingWebhookEvents)
    .set({ processedAt: new Date(), error: null })
    .where(eq(billingWebhookEvents.eventId, eventId));
  return outcome;
}
