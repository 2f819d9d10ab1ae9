// Webhook acknowledgement time: signed deliveries, 20 at a time, to the webhook route.
// Default: the route handler behind a local HTTP server (no Next overhead); BENCH_URL=http://…
// aims at a running app instead. Needs DATABASE_URL (events and queue jobs are written there).
//   npm run bench:billing               BENCH_EVENTS=1000 BENCH_CONCURRENCY=20
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { loadavg, cpus } from "node:os";
import { getEnv } from "@/lib/env";
import { getPool } from "@/db/client";
import { signPayload } from "@/mocks/stripe/webhooks";
import { POST } from "@/app/api/v1/billing/webhook/route";

const EVENTS = Number(process.env.BENCH_EVENTS ?? 1000);
const CONCURRENCY = Number(process.env.BENCH_CONCURRENCY ?? 20);
const secret = getEnv().STRIPE_WEBHOOK_SECRET;

async function localTarget(): Promise<{ url: string; close: () => Promise<void> }> {
  const server = createServer((req, res) => {
    void (async () => {
      const chunks: Buffer[] = [];
      for await (const c of req) chunks.push(c as Buffer);
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
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", () => r()));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/`,
    close: () => new Promise((r) => server.close(() => r())),
  };
}

function eventBody(id: string): string {
  return JSON.stringify({
    id,
    object: "event",
    type: "customer.updated",
    api_version: "2026-10-28.endive",
    created: Math.floor(Date.now() / 1000),
    data: { object: { id: `cus_bench_${id}`, object: "customer" } },
  });
}

async function deliver(url: string, body: string): Promise<number> {
  const t0 = performance.now();
  const res = await fetch(url, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      "stripe-signature": signPayload(body, secret, Math.floor(Date.now() / 1000)),
    },
    body,
  });
  await res.text();
  if (res.status !== 200) throw new Error(`webhook answered ${res.status}`);
  return performance.now() - t0;
}

async function run(url: string, bodies: string[]): Promise<number[]> {
  const times: number[] = [];
  let next = 0;
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (next < bodies.length) times.push(await deliver(url, bodies[next++]!));
    }),
  );
  return times.sort((a, b) => a - b);
}

const pct = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;

const target = process.env.BENCH_URL
  ? { url: process.env.BENCH_URL, close: async () => undefined }
  : await localTarget();
const tag = `${Date.now().toString(36)}`;
// Warm-up: connections, the queue client and prepared plans.
await run(
  target.url,
  Array.from({ length: 40 }, (_, i) => eventBody(`evt_warm_${tag}_${i}`)),
);
const distinct = await run(
  target.url,
  Array.from({ length: EVENTS }, (_, i) => eventBody(`evt_bench_${tag}_${i}`)),
);
const dupBody = eventBody(`evt_dup_${tag}`);
const duplicates = await run(
  target.url,
  Array.from({ length: EVENTS }, () => dupBody),
);
const line = (name: string, t: number[]) =>
  `${name.padEnd(28)} n=${t.length}  p50 ${pct(t, 50).toFixed(1)} ms  p95 ${pct(t, 95).toFixed(1)} ms  p99 ${pct(t, 99).toFixed(1)} ms  max ${t.at(-1)!.toFixed(1)} ms`;
console.log(
  `webhook ack, ${CONCURRENCY} concurrent deliveries, target ${process.env.BENCH_URL ?? "route handler (local HTTP)"}`,
);
console.log(
  `machine: ${cpus().length} cores (${cpus()[0]?.model ?? "?"}), load ${loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}`,
);
console.log(line("distinct events (queued)", distinct));
console.log(line("one event, duplicates", duplicates));
await target.close();
await getPool().end();
process.exit(0);
