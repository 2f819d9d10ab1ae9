/**
 * Billing against the running Stripe fake (real HTTP, real PostgreSQL, real pg-boss worker):
 * checkout → webhook → allowance, declines, signature checks, duplicate and out-of-order
 * delivery, and the allowance under concurrency.
 * The signature scheme (t=…,v1=HMAC-SHA256 of "t.payload", 300 s tolerance) is Stripe's
 * published webhook scheme, checked here by the official SDK's constructEvent.
 */
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { payOnCheckoutPage, startBillingHarness, waitFor } from "./support";

const harness = await startBillingHarness();
const { getDb, getPool } = await import("@/db/client");
const schema = await import("@/db/schema");
const { createTestMember } = await import("@/tests/support/session");
const { seedBillingPlans } = await import("@/scripts/seed/billing");
const { billingProvider, createStripeClient } = await import("@/features/billing/server/stripe");
const { startBillingWorker } = await import("@/features/billing/server/billing-worker");
const { startCheckout } = await import("@/features/billing/server/start-checkout");
const { changeSubscription } = await import("@/features/billing/server/change-subscription");
const { consumeReportAllowance, getAllowanceSummary, ReportAllowanceError } =
  await import("@/features/billing");
const { signPayload } = await import("@/mocks/stripe/webhooks");
const { POST } = await import("@/app/api/v1/billing/webhook/route");

const db = getDb();
const provider = billingProvider(
  createStripeClient({ apiBase: harness.fake.url, maxNetworkRetries: 0 }),
);
const mails: { to: string; subject: string; text: string }[] = [];
const SECRET = "whsec_treadcast_local_fake_secret";
let worker: Awaited<ReturnType<typeof startBillingWorker>>;

beforeAll(async () => {
  await seedBillingPlans(db);
  worker = await startBillingWorker({
    deps: { db, provider, mailer: { send: async (m) => void mails.push(m) } },
    connectionString: process.env.DATABASE_URL!,
    log: () => undefined,
  });
});
afterAll(async () => {
  await worker.stop();
  await harness.stop();
  await getPool().end();
});

const APP = "http://localhost:3000";

async function account(dealershipId: string) {
  const [row] = await db
    .select()
    .from(schema.billingAccounts)
    .where(eq(schema.billingAccounts.dealershipId, dealershipId));
  return row!;
}

async function billingAdmin() {
  return createTestMember({ db, roles: ["billing_admin"] });
}

function postEvent(payload: string, signature: string) {
  return POST(
    new Request(`${APP}/api/v1/billing/webhook`, {
      method: "POST",
      headers: { "stripe-signature": signature },
      body: payload,
    }),
  );
}

function eventsOf(type: string, objectId: string) {
  return harness.fake.fake.store
    .all("event")
    .filter(
      (e) => e.type === type && (e.data as { object: { id: string } }).object.id === objectId,
    );
}

describe("checkout", () => {
  it("a new dealership starts on the 14-day trial", async () => {
    const m = await billingAdmin();
    const a = await account(m.dealership.id);
    expect(a.status).toBe("trialing");
    const days = (a.trialEndsAt!.getTime() - a.trialStartedAt!.getTime()) / 86_400_000;
    expect(days).toBeCloseTo(14, 5);
  });

  it("paying with 4242… → webhook → monthly allowance granted, receipt mailed", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-monthly",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    const paid = await payOnCheckoutPage(started.value.url, "4242 4242 4242 4242");
    expect(paid.status).toBe(303);
    expect(paid.location).toMatch(
      /^http:\/\/localhost:3000\/billing\?checkout=done&session_id=cs_test_/,
    );
    const a = await waitFor(async () => {
      const row = await account(m.dealership.id);
      return row.status === "active" ? row : null;
    }, "the subscription to be applied by the webhook");
    expect(a.planKey).toBe("tc-yard-monthly");
    expect(a.trialEndsAt).toBeNull();
    const summary = await getAllowanceSummary({ actor: m.actor });
    expect(summary).toMatchObject({
      planName: "Yard monthly",
      included: 25,
      used: 0,
      blocked: null,
    });
    const use = await db.transaction((tx) =>
      consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId: randomUUID() }),
    );
    expect(use).toMatchObject({ source: "included", used: 1, included: 25 });
    await waitFor(
      async () => mails.find((x) => x.to === m.user.email && /Receipt/.test(x.subject)),
      "the receipt",
    );
  });

  it("the decline card 4000 0000 0000 0002 fails clearly and grants nothing", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-monthly",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    const declined = await payOnCheckoutPage(started.value.url, "4000000000000002");
    expect(declined.status).toBe(402);
    expect(declined.text).toContain("Your card was declined. Nothing was charged.");
    await new Promise((r) => setTimeout(r, 500));
    const a = await account(m.dealership.id);
    expect(a.status).toBe("trialing");
    expect(a.providerSubscriptionId).toBeNull();
  });
});

describe("webhook route", () => {
  const payload = JSON.stringify({
    id: `evt_forged_${randomUUID()}`,
    object: "event",
    type: "invoice.paid",
    data: { object: { id: "in_x" } },
  });

  it("a tampered body gets 400 and records nothing", async () => {
    const sig = signPayload(payload, SECRET, Math.floor(Date.now() / 1000));
    const res = await postEvent(payload.replace("invoice.paid", "invoice.payment_failed"), sig);
    expect(res.status).toBe(400);
    expect(
      await db
        .select()
        .from(schema.billingWebhookEvents)
        .where(eq(schema.billingWebhookEvents.eventId, JSON.parse(payload).id)),
    ).toHaveLength(0);
  });

  it("a replayed event with a stale timestamp (over 300 s) gets 400", async () => {
    const res = await postEvent(
      payload,
      signPayload(payload, SECRET, Math.floor(Date.now() / 1000) - 600),
    );
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/tolerance/i);
  });

  it("a wrong secret or a missing header gets 400", async () => {
    expect(
      (
        await postEvent(
          payload,
          signPayload(payload, "whsec_wrong_secret", Math.floor(Date.now() / 1000)),
        )
      ).status,
    ).toBe(400);
    expect((await postEvent(payload, "")).status).toBe(400);
  });

  it("20 concurrent duplicate deliveries of one event are applied once; the fake retries a failed delivery", async () => {
    const m = await billingAdmin();
    harness.state.accepting = false;
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-bundle-10",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    const sessionId = started.value.url.split("/").pop()!;
    expect((await payOnCheckoutPage(started.value.url, "4242424242424242")).status).toBe(303);
    const [event] = eventsOf("checkout.session.completed", sessionId);
    const body = JSON.stringify(event, null, 2);
    const answers = await Promise.all(
      Array.from({ length: 20 }, () =>
        postEvent(body, signPayload(body, SECRET, Math.floor(Date.now() / 1000))),
      ),
    );
    const parsed = await Promise.all(answers.map((r) => r.json()));
    expect(answers.every((r) => r.status === 200)).toBe(true);
    expect(parsed.filter((p) => p.duplicate === false)).toHaveLength(1);
    await waitFor(
      async () => (await account(m.dealership.id)).packCredits === 10,
      "the bundle credit",
    );
    // The fake's own delivery was refused (503) while paused; it retries with backoff.
    const before = harness.state.deliveries;
    harness.state.accepting = true;
    await harness.fake.fake.webhooks.idle(15_000);
    expect(harness.state.deliveries).toBeGreaterThan(before);
    await new Promise((r) => setTimeout(r, 800));
    expect((await account(m.dealership.id)).packCredits).toBe(10);
    expect(
      await db
        .select()
        .from(schema.billingWebhookEvents)
        .where(eq(schema.billingWebhookEvents.eventId, event!.id)),
    ).toHaveLength(1);
  });

  it("out-of-order delivery ends in the provider's current state", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-annual",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    await payOnCheckoutPage(started.value.url, "4242424242424242");
    const subId = await waitFor(
      async () => (await account(m.dealership.id)).providerSubscriptionId,
      "the subscription",
    );
    await harness.fake.fake.webhooks.idle();
    harness.state.accepting = false;
    await provider.setCancelAtPeriodEnd(subId, true);
    await provider.setCancelAtPeriodEnd(subId, false);
    const [older, newer] = eventsOf("customer.subscription.updated", subId).slice(-2);
    expect(
      (older!.data as { object: { cancel_at_period_end: boolean } }).object.cancel_at_period_end,
    ).toBe(true);
    for (const e of [newer!, older!]) {
      const body = JSON.stringify(e);
      expect(
        (await postEvent(body, signPayload(body, SECRET, Math.floor(Date.now() / 1000)))).status,
      ).toBe(200);
    }
    await waitFor(async () => {
      const rows = await db
        .select()
        .from(schema.billingWebhookEvents)
        .where(eq(schema.billingWebhookEvents.eventId, older!.id));
      return rows[0]?.processedAt;
    }, "the older event to be worked");
    expect((await account(m.dealership.id)).cancelAtPeriodEnd).toBe(false);
    harness.state.accepting = true;
  });
});

describe("subscription changes", () => {
  it("cancel at period end blocks nothing until the end, resume clears it", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-monthly",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    await payOnCheckoutPage(started.value.url, "4242424242424242");
    await waitFor(async () => (await account(m.dealership.id)).status === "active", "active");
    expect(
      await changeSubscription({ db, provider, actor: m.actor, change: { kind: "cancel" } }),
    ).toEqual({ ok: true });
    expect((await account(m.dealership.id)).cancelAtPeriodEnd).toBe(true);
    expect((await getAllowanceSummary({ actor: m.actor }))?.blocked).toBeNull();
    expect(
      await changeSubscription({ db, provider, actor: m.actor, change: { kind: "resume" } }),
    ).toEqual({ ok: true });
    expect((await account(m.dealership.id)).cancelAtPeriodEnd).toBe(false);
  });

  it("switching monthly → annual is prorated and applied; an estimator may not", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-monthly",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    await payOnCheckoutPage(started.value.url, "4242424242424242");
    await waitFor(async () => (await account(m.dealership.id)).status === "active", "active");
    const est = await createTestMember({ db, roles: ["estimator"], dealershipId: m.dealership.id });
    expect(
      await changeSubscription({
        db,
        provider,
        actor: est.actor,
        change: { kind: "switch", planKey: "tc-yard-annual" },
      }),
    ).toMatchObject({ ok: false, code: "forbidden" });
    expect(
      await changeSubscription({
        db,
        provider,
        actor: m.actor,
        change: { kind: "switch", planKey: "tc-yard-annual" },
      }),
    ).toEqual({ ok: true });
    const a = await account(m.dealership.id);
    expect(a.planKey).toBe("tc-yard-annual");
    const invoices = await provider.listInvoices(a.providerCustomerId!);
    const latest = invoices.data[0]!;
    // Credit for unused monthly time is negative and at most the monthly price.
    const credit = latest.lines.data.find((l) => l.amount < 0);
    expect(credit && credit.amount >= -3900).toBe(true);
  });

  it("a failed renewal puts the plan past due with a grace period and a mail", async () => {
    const m = await billingAdmin();
    const started = await startCheckout({
      db,
      provider,
      actor: m.actor,
      planKey: "tc-yard-monthly",
      appUrl: APP,
    });
    if (!started.ok) throw new Error(started.message);
    // 4000 0000 0000 0341: Stripe's test card that attaches but fails when charged later.
    await payOnCheckoutPage(started.value.url, "4000000000000341");
    const subId = await waitFor(
      async () => (await account(m.dealership.id)).providerSubscriptionId,
      "sub",
    );
    const renew = await fetch(`${harness.fake.url}/_fake/subscriptions/${subId}/renew`, {
      method: "POST",
    });
    expect(renew.status).toBe(200);
    const a = await waitFor(async () => {
      const row = await account(m.dealership.id);
      return row.status === "past_due" ? row : null;
    }, "past due");
    expect(a.pastDueSince).not.toBeNull();
    const summary = await getAllowanceSummary({ actor: m.actor });
    expect(summary?.graceEndsAt).not.toBeNull();
    expect(summary?.blocked).toBeNull();
    await waitFor(
      async () => mails.find((x) => x.to === m.user.email && /Payment failed/.test(x.subject)),
      "the mail",
    );
  });
});

describe("allowance", () => {
  it("50 concurrent report issues against a quota of 10 give exactly 10 successes", async () => {
    const m = await billingAdmin(); // on the trial: 10 reports
    const results = await Promise.allSettled(
      Array.from({ length: 50 }, () =>
        db.transaction((tx) =>
          consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId: randomUUID() }),
        ),
      ),
    );
    const ok = results.filter((r) => r.status === "fulfilled");
    const refused = results.filter((r) => r.status === "rejected");
    expect(ok).toHaveLength(10);
    expect(refused).toHaveLength(40);
    for (const r of refused) {
      const reason = (r as PromiseRejectedResult).reason;
      expect(reason).toBeInstanceOf(ReportAllowanceError);
      expect(reason.code).toBe("quota_reached");
      expect(reason.billingHref).toBe("/billing");
    }
    expect((await getAllowanceSummary({ actor: m.actor }))?.used).toBe(10);
  });

  it("the same report counts once; a rolled-back issue counts nothing", async () => {
    const m = await billingAdmin();
    const reportId = randomUUID();
    await db.transaction((tx) =>
      consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId }),
    );
    const again = await db.transaction((tx) =>
      consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId }),
    );
    expect(again).toMatchObject({ replayed: true, used: 1 });
    await expect(
      db.transaction(async (tx) => {
        await consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId: randomUUID() });
        throw new Error("report rendering failed");
      }),
    ).rejects.toThrow("report rendering failed");
    expect((await getAllowanceSummary({ actor: m.actor }))?.used).toBe(1);
  });

  it("a cancelled plan blocks new reports with a message for the estimator; customers see no counter", async () => {
    const m = await billingAdmin();
    await db
      .update(schema.billingAccounts)
      .set({ status: "cancelled" })
      .where(eq(schema.billingAccounts.dealershipId, m.dealership.id));
    const err = await db
      .transaction((tx) =>
        consumeReportAllowance(tx, { dealershipId: m.dealership.id, reportId: randomUUID() }),
      )
      .catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ReportAllowanceError);
    expect((err as InstanceType<typeof ReportAllowanceError>).code).toBe("cancelled");
    expect((err as Error).message).toMatch(/ask your billing admin/i);
    const customer = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: m.dealership.id,
    });
    expect(await getAllowanceSummary({ actor: customer.actor })).toBeNull();
  });
});
