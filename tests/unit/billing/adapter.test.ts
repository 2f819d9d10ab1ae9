/**
 * The billing adapter over the official stripe SDK, against the fake's handlers served by msw
 * at the real API host. Error shapes follow Stripe's published API reference (errors: type,
 * code, message; 402 card_error, 429 rate_limit_error; idempotency_error on a reused key).
 */
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { http, HttpResponse } from "msw";
import { setupServer } from "msw/node";
import { createFakeStripe } from "@/mocks/stripe/fake-stripe";
import { stripeMswHandlers } from "@/mocks/stripe/msw";
import {
  BillingProviderError,
  billingProvider,
  createStripeClient,
} from "@/features/billing/server/stripe";

const fake = createFakeStripe({ publicUrl: "https://pay.fake.test" });
const server = setupServer(...stripeMswHandlers(fake));
// The real host, whatever STRIPE_API_BASE the test command exports: msw answers it.
const provider = billingProvider(
  createStripeClient({ apiBase: "https://api.stripe.com", maxNetworkRetries: 0 }),
);
const API = "https://api.stripe.com/v1";

beforeAll(() => server.listen({ onUnhandledRequest: "error" }));
afterEach(() => server.resetHandlers());
afterAll(() => server.close());

async function failure(run: () => Promise<unknown>): Promise<BillingProviderError> {
  const error = await run().then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(BillingProviderError);
  return error as BillingProviderError;
}

describe("billing adapter", () => {
  it("creates a customer once per dealership: a retried create replays the first answer", async () => {
    const a = await provider.createCustomer({
      dealershipId: "d-1",
      name: "Fen Yard",
      email: "a@x.test",
    });
    const b = await provider.createCustomer({
      dealershipId: "d-1",
      name: "Fen Yard",
      email: "a@x.test",
    });
    expect(b.id).toBe(a.id);
    expect(fake.store.all("customer").filter((c) => c.name === "Fen Yard")).toHaveLength(1);
  });

  it("a reused idempotency key with other parameters is a clear conflict", async () => {
    await provider.createCustomer({ dealershipId: "d-2", name: "Marsh Lane", email: null });
    const e = await failure(() =>
      provider.createCustomer({ dealershipId: "d-2", name: "Renamed", email: null }),
    );
    expect(e.code).toBe("idempotency_conflict");
    expect(e.message).toMatch(/reload the page/i);
  });

  it("finds a plan's price by lookup key after creating it once", async () => {
    const plan = {
      key: "p-month",
      name: "Test monthly",
      kind: "monthly" as const,
      currency: "gbp",
      priceMinor: 3900,
    };
    const first = await provider.ensurePrice(plan);
    const again = await provider.ensurePrice(plan);
    expect(again.id).toBe(first.id);
    expect(first).toMatchObject({
      unit_amount: 3900,
      currency: "gbp",
      recurring: { interval: "month" },
    });
  });

  it("creates a subscription checkout session with a hosted page URL", async () => {
    const customer = await provider.createCustomer({
      dealershipId: "d-3",
      name: "Oak Row",
      email: null,
    });
    const price = await provider.ensurePrice({
      key: "p-year",
      name: "Test annual",
      kind: "annual",
      currency: "gbp",
      priceMinor: 42000,
    });
    const session = await provider.createCheckoutSession({
      customerId: customer.id,
      priceId: price.id,
      mode: "subscription",
      dealershipId: "d-3",
      planKey: "p-year",
      successUrl: "http://app.test/billing?session_id={CHECKOUT_SESSION_ID}",
      cancelUrl: "http://app.test/billing",
    });
    expect(session.url).toBe(`https://pay.fake.test/checkout/${session.id}`);
    expect(session).toMatchObject({
      mode: "subscription",
      status: "open",
      client_reference_id: "d-3",
    });
  });

  it("a one-off price in subscription mode is refused with the API's words", async () => {
    const customer = await provider.createCustomer({
      dealershipId: "d-4",
      name: "Mill End",
      email: null,
    });
    const price = await provider.ensurePrice({
      key: "p-pack",
      name: "Pack",
      kind: "pack",
      currency: "gbp",
      priceMinor: 4500,
    });
    const e = await failure(() =>
      provider.createCheckoutSession({
        customerId: customer.id,
        priceId: price.id,
        mode: "subscription",
        dealershipId: "d-4",
        planKey: "p-pack",
        successUrl: "http://app.test/ok",
        cancelUrl: "http://app.test/no",
      }),
    );
    expect(e.code).toBe("invalid_request");
    expect(e.message).toMatch(/recurring price/);
  });

  it("an unknown subscription is a resource_missing error", async () => {
    const e = await failure(() => provider.retrieveSubscription("sub_nope"));
    expect(e.code).toBe("invalid_request");
    expect(e.message).toContain("No such subscription: 'sub_nope'");
  });

  it("a declined card reads as a decline with nothing charged", async () => {
    server.use(
      http.post(`${API}/subscriptions/:id`, () =>
        HttpResponse.json(
          {
            error: {
              type: "card_error",
              code: "card_declined",
              decline_code: "generic_decline",
              message: "Your card was declined.",
            },
          },
          { status: 402 },
        ),
      ),
    );
    const e = await failure(() => provider.setCancelAtPeriodEnd("sub_1", false));
    expect(e.code).toBe("card_declined");
    expect(e.message).toMatch(/declined.*Nothing was charged/);
    expect(e.retryable).toBe(false);
  });

  it("a rate limit asks the admin to wait and changes nothing", async () => {
    server.use(
      http.get(`${API}/invoices`, () =>
        HttpResponse.json(
          { error: { type: "rate_limit_error", message: "Too many requests" } },
          { status: 429 },
        ),
      ),
    );
    const e = await failure(() => provider.listInvoices("cus_1"));
    expect(e.code).toBe("rate_limited");
    expect(e.retryable).toBe(true);
  });

  it("a network failure says the service could not be reached", async () => {
    server.use(http.get(`${API}/customers/:id`, () => HttpResponse.error()));
    const e = await failure(() => provider.retrieveCustomer("cus_1"));
    expect(e.code).toBe("unreachable");
    expect(e.message).toMatch(/could not reach the payment service/);
  });

  it("a wrong key is reported as a configuration problem", async () => {
    const bad = billingProvider(
      createStripeClient({
        apiBase: "https://api.stripe.com",
        secretKey: "rk_live_wrong",
        maxNetworkRetries: 0,
      }),
    );
    const e = await failure(() => bad.retrieveCustomer("cus_1"));
    expect(e.code).toBe("auth");
  });

  it("verifies a webhook signed by the fake and refuses a tampered one", async () => {
    const { signPayload } = await import("@/mocks/stripe/webhooks");
    const payload = JSON.stringify({
      id: "evt_1",
      object: "event",
      type: "invoice.paid",
      data: { object: { id: "in_1" } },
    });
    const header = signPayload(payload, "whsec_unit", Math.floor(Date.now() / 1000));
    expect(provider.verifyWebhook(payload, header, "whsec_unit").id).toBe("evt_1");
    expect(() =>
      provider.verifyWebhook(payload.replace("in_1", "in_2"), header, "whsec_unit"),
    ).toThrow();
  });
});
