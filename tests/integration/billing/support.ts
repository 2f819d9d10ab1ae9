import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";

/**
 * Starts the Stripe fake on a free port, pointed at a local HTTP endpoint that hands each
 * delivery to the app's real webhook route handler. Set STRIPE_API_BASE before the app's
 * modules are imported (getEnv caches).
 */
export async function startBillingHarness() {
  const state = { accepting: true, deliveries: 0 };
  const forwarder: Server = createServer((req, res) => {
    void (async () => {
      state.deliveries += 1;
      const chunks: Buffer[] = [];
      for await (const c of req) chunks.push(c as Buffer);
      if (!state.accepting) {
        res.writeHead(503).end("paused");
        return;
      }
      const { POST } = await import("@/app/api/v1/billing/webhook/route");
      const answer = await POST(
        new Request("http://localhost/api/v1/billing/webhook", {
          method: "POST",
          headers: { "stripe-signature": String(req.headers["stripe-signature"] ?? "") },
          body: Buffer.concat(chunks).toString("utf8"),
        }),
      );
      res.writeHead(answer.status, { "content-type": "application/json" });
      res.end(await answer.text());
    })();
  });
  await new Promise<void>((r) => forwarder.listen(0, "127.0.0.1", () => r()));
  const hookPort = (forwarder.address() as AddressInfo).port;
  const { startStripeFake } = await import("@/mocks/stripe/server");
  const fake = await startStripeFake({
    port: 0,
    webhook: {
      url: `http://127.0.0.1:${hookPort}/hook`,
      secret: process.env.STRIPE_WEBHOOK_SECRET ?? "whsec_treadcast_local_fake_secret",
    },
    retryDelaysMs: [150, 300, 600, 1200, 2400],
  });
  process.env.STRIPE_API_BASE = fake.url;
  return {
    fake,
    state,
    stop: async () => {
      await fake.stop();
      await new Promise<void>((r) => forwarder.close(() => r()));
    },
  };
}

export async function waitFor<T>(
  probe: () => Promise<T | null | undefined | false>,
  what: string,
  timeoutMs = 15_000,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Pays on the fake's hosted checkout page as a browser form would. */
export async function payOnCheckoutPage(url: string, cardNumber: string) {
  const res = await fetch(url, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ card_number: cardNumber, card_expiry: "12/34", card_cvc: "123" }),
  });
  return { status: res.status, location: res.headers.get("location"), text: await res.text() };
}
