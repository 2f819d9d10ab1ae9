import { jsonError } from "@/app/api/_lib/errors";
import { receiveWebhook } from "@/features/billing/server/receive-webhook";

/**
 * Payment provider events. Public by design: the caller is authenticated by the
 * Stripe-Signature HMAC over the raw body, not by a session.
 */
export async function POST(req: Request): Promise<Response> {
  const rawBody = await req.text();
  const outcome = await receiveWebhook({
    rawBody,
    signature: req.headers.get("stripe-signature"),
  });
  if (!outcome.ok) return jsonError(outcome.status, "invalid_signature", outcome.message);
  return Response.json(
    { received: true, duplicate: outcome.duplicate },
    { headers: { "cache-control": "no-store" } },
  );
}
