import "server-only";
import { eq } from "drizzle-orm";
import type Stripe from "stripe";
import { getDb } from "@/db/client";
import { billingWebhookEvents } from "@/db/schema";
import { getEnv } from "@/lib/env";
import { enqueueWebhookEvent } from "@/features/billing/server/billing-queue";
import { billingProvider } from "@/features/billing/server/stripe";

export type TWebhookOutcome =
  { ok: true; duplicate: boolean; eventId: string } | { ok: false; status: 400; message: string };

/**
 * The webhook's whole job: check the signature on the raw body, record the event once (the
 * primary key decides between concurrent duplicates) and queue it. No billing state changes
 * here, so a bad signature changes nothing and the answer goes out in milliseconds.
 */
export async function receiveWebhook({
  rawBody,
  signature,
}: {
  rawBody: string;
  signature: string | null;
}): Promise<TWebhookOutcome> {
  if (!signature) return { ok: false, status: 400, message: "Missing Stripe-Signature header." };
  let event: Stripe.Event;
  try {
    event = billingProvider().verifyWebhook(rawBody, signature, getEnv().STRIPE_WEBHOOK_SECRET);
  } catch (error) {
    return {
      ok: false,
      status: 400,
      message: `Signature check failed: ${(error as Error).message}`,
    };
  }
  const object = event.data.object as { id?: string };
  const db = getDb();
  const [inserted] = await db
    .insert(billingWebhookEvents)
    .values({ eventId: event.id, type: event.type, objectId: object.id ?? null })
    .onConflictDoNothing()
    .returning({ eventId: billingWebhookEvents.eventId });
  if (!inserted) return { ok: true, duplicate: true, eventId: event.id };
  try {
    await enqueueWebhookEvent(event.id);
  } catch (error) {
    // Forget the event so the provider's retry is accepted again.
    await db.delete(billingWebhookEvents).where(eq(billingWebhookEvents.eventId, event.id));
    throw error;
  }
  return { ok: true, duplicate: false, eventId: event.id };
}
