import { createHmac } from "node:crypto";
import type { TFakeContext } from "@/mocks/stripe/api";
import type { FakeStore, TObj } from "@/mocks/stripe/store";

/** The header value the real service sends: `t=<seconds>,v1=<HMAC-SHA256 of "t.payload">`. */
export function signPayload(payload: string, secret: string, timestamp: number): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`).digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

export type TWebhookTarget = { url: string; secret: string };

/** Delays before each retry after a non-2xx answer; the real service spreads them over days. */
export const DEFAULT_RETRY_DELAYS_MS = [1_000, 2_000, 4_000, 8_000, 16_000, 32_000, 64_000];

/**
 * Records events and delivers them, signed, to the app's webhook route. A non-2xx answer or a
 * network error schedules a retry with backoff; pending deliveries live in the store, so a
 * restart picks them up.
 */
export class WebhookSender {
  private timer: NodeJS.Timeout | null = null;
  private inFlight = new Set<string>();
  constructor(
    private readonly store: FakeStore,
    private target: TWebhookTarget | null,
    private readonly retryDelaysMs: number[] = DEFAULT_RETRY_DELAYS_MS,
    private readonly log: (m: string) => void = () => undefined,
  ) {}

  emit(ctx: Pick<TFakeContext, "now">, type: string, object: TObj): TObj {
    const event = this.store.put({
      id: this.store.newId("evt"),
      object: "event",
      type,
      api_version: "2026-10-28.endive",
      created: Math.floor(ctx.now() / 1000),
      livemode: false,
      pending_webhooks: this.target ? 1 : 0,
      request: { id: null, idempotency_key: null },
      // A snapshot: the object as it was when the event happened, like the real service.
      data: { object: JSON.parse(JSON.stringify(object)) as TObj },
    });
    if (this.target) this.store.state.deliveries.push({ eventId: event.id, attempt: 0, dueAt: 0 });
    this.schedule(0);
    return event;
  }

  start(): void {
    this.schedule(0);
  }

  stop(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.target = null;
  }

  private schedule(ms: number) {
    if (!this.target) return;
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.run(), ms);
    this.timer.unref?.();
  }

  private async run() {
    this.timer = null;
    const target = this.target;
    if (!target) return;
    const now = Date.now();
    const due = this.store.state.deliveries.filter(
      (d) => d.dueAt <= now && !this.inFlight.has(d.eventId),
    );
    await Promise.all(due.map((d) => this.deliver(target, d)));
    const next = this.store.state.deliveries
      .filter((d) => !this.inFlight.has(d.eventId))
      .reduce((min, d) => Math.min(min, d.dueAt), Infinity);
    if (Number.isFinite(next)) this.schedule(Math.max(0, next - Date.now()));
  }

  private async deliver(
    target: TWebhookTarget,
    d: { eventId: string; attempt: number; dueAt: number },
  ) {
    const event = this.store.get(d.eventId);
    if (!event) return this.drop(d.eventId);
    this.inFlight.add(d.eventId);
    const payload = JSON.stringify(event, null, 2);
    let ok = false;
    let detail = "";
    try {
      const res = await fetch(target.url, {
        method: "POST",
        headers: {
          "content-type": "application/json; charset=utf-8",
          "stripe-signature": signPayload(payload, target.secret, Math.floor(Date.now() / 1000)),
          "user-agent": "treadcast-payments-fake/1.0",
        },
        body: payload,
        signal: AbortSignal.timeout(10_000),
      });
      ok = res.ok;
      detail = String(res.status);
      await res.arrayBuffer().catch(() => undefined);
    } catch (e) {
      detail = (e as Error).message;
    }
    this.inFlight.delete(d.eventId);
    if (ok) {
      event.pending_webhooks = 0;
      this.drop(d.eventId);
    } else {
      const delay = this.retryDelaysMs[d.attempt];
      if (delay === undefined) {
        this.log(
          `[stripe-fake] giving up on ${event.id} (${String(event.type)}) after ${d.attempt + 1} tries`,
        );
        this.drop(d.eventId);
      } else {
        this.log(
          `[stripe-fake] ${event.id} (${String(event.type)}) got ${detail}; retry in ${delay} ms`,
        );
        d.attempt += 1;
        d.dueAt = Date.now() + delay;
      }
    }
    this.store.save();
  }

  private drop(eventId: string) {
    this.store.state.deliveries = this.store.state.deliveries.filter((x) => x.eventId !== eventId);
  }

  /** Resolves once nothing is waiting or in flight (tests). */
  async idle(timeoutMs = 10_000): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    while (this.store.state.deliveries.length || this.inFlight.size) {
      if (Date.now() > deadline) throw new Error("webhook deliveries still pending");
      await new Promise((r) => setTimeout(r, 25));
    }
  }
}
