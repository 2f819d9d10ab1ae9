import { createServer, type IncomingMessage } from "node:http";
import type { AddressInfo } from "node:net";
import { getEnv } from "@/lib/env";
import type { Fake } from "@/mocks/fake";
import { createFakeStripe, type TFakeStripe } from "@/mocks/stripe/fake-stripe";
import type { TWebhookTarget } from "@/mocks/stripe/webhooks";

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

/** Serves the fake Stripe API and its hosted pages on a loopback port. */
export async function startStripeFake(opts: {
  port: number;
  host?: string;
  stateFile?: string;
  webhook?: TWebhookTarget | null;
  retryDelaysMs?: number[];
  log?: (m: string) => void;
}): Promise<{ url: string; port: number; fake: TFakeStripe; stop: () => Promise<void> }> {
  const host = opts.host ?? "127.0.0.1";
  const holder: { fake?: TFakeStripe } = {};
  const server = createServer((req, res) => {
    void (async () => {
      try {
        const url = new URL(req.url ?? "/", "http://fake");
        const headers = new Headers();
        for (const [k, v] of Object.entries(req.headers))
          if (typeof v === "string") headers.set(k, v);
        const answer = await holder.fake!.handle({
          method: req.method ?? "GET",
          path: url.pathname,
          query: url.search.slice(1),
          headers,
          body: await readBody(req),
        });
        const isBinary = Buffer.isBuffer(answer.body);
        const isText = typeof answer.body === "string";
        res.writeHead(answer.status, {
          "content-type": isBinary || isText ? "text/plain" : "application/json",
          "request-id": `req_${Math.random().toString(36).slice(2, 14)}`,
          ...answer.headers,
        });
        res.end(isBinary || isText ? answer.body : JSON.stringify(answer.body));
      } catch (e) {
        res.writeHead(500, { "content-type": "application/json" });
        res.end(JSON.stringify({ error: { type: "api_error", message: (e as Error).message } }));
      }
    })();
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  const url = `http://${host}:${port}`;
  const fake = (holder.fake = createFakeStripe({
    publicUrl: `http://localhost:${port}`,
    stateFile: opts.stateFile,
    webhook: opts.webhook,
    retryDelaysMs: opts.retryDelaysMs,
    log: opts.log,
  }));
  fake.webhooks.start();
  return {
    url,
    port,
    fake,
    stop: async () => {
      fake.webhooks.stop();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

export const stripeFake: Fake = {
  name: "payments (Stripe API)",
  start: () => {
    const env = getEnv();
    return startStripeFake({
      port: env.STRIPE_FAKE_PORT,
      stateFile: `var/stripe-fake/state-${env.STRIPE_FAKE_PORT}.json`,
      webhook: { url: `${env.APP_URL}/api/v1/billing/webhook`, secret: env.STRIPE_WEBHOOK_SECRET },
      log: console.log,
    });
  },
};
