// The one adapter over the payment provider. Runs in the app and in the worker (scripts/worker.ts),
// so no "server-only" marker; nothing here is imported by client code.
import Stripe from "stripe";
import { getEnv } from "@/lib/env";

/** What went wrong talking to the provider, in words for the billing admin. */
export class BillingProviderError extends Error {
  constructor(
    readonly code:
      | "card_declined"
      | "rate_limited"
      | "unreachable"
      | "idempotency_conflict"
      | "invalid_request"
      | "auth"
      | "provider_error",
    message: string,
    /** Worth trying again later (network, rate limit, provider outage). */
    readonly retryable: boolean,
  ) {
    super(message);
    this.name = "BillingProviderError";
  }
}

/** Maps the SDK's error classes to a BillingProviderError; anything else is rethrown as is. */
export function toBillingProviderError(error: unknown): BillingProviderError {
  if (error instanceof BillingProviderError) return error;
  if (error instanceof Stripe.errors.StripeCardError)
    return new BillingProviderError(
      "card_declined",
      `The card was declined${error.message ? ` (${error.message.replace(/\.$/, "")})` : ""}. Nothing was charged; try another card.`,
      false,
    );
  if (error instanceof Stripe.errors.StripeRateLimitError)
    return new BillingProviderError(
      "rate_limited",
      "The payment service is busy right now. Wait a minute and try again; nothing was changed.",
      true,
    );
  if (error instanceof Stripe.errors.StripeConnectionError)
    return new BillingProviderError(
      "unreachable",
      "Treadcast could not reach the payment service. Check back in a few minutes; nothing was changed.",
      true,
    );
  if (error instanceof Stripe.errors.StripeIdempotencyError)
    return new BillingProviderError(
      "idempotency_conflict",
      "This billing change clashed with an earlier one that is still being applied. Reload the page to see the current plan.",
      false,
    );
  if (error instanceof Stripe.errors.StripeAuthenticationError)
    return new BillingProviderError(
      "auth",
      "Billing is not configured correctly (the payment service refused Treadcast's key). Tell your Treadcast administrator.",
      false,
    );
  if (error instanceof Stripe.errors.StripeInvalidRequestError)
    return new BillingProviderError(
      "invalid_request",
      `The payment service refused the request: ${error.message}`,
      false,
    );
  if (error instanceof Stripe.errors.StripeError)
    return new BillingProviderError(
      "provider_error",
      "The payment service had a problem. Try again in a few minutes; nothing was changed.",
      true,
    );
  throw error;
}

/** Runs a provider call, turning provider failures into BillingProviderError. */
async function call<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    throw toBillingProviderError(error);
  }
}

/** A client for the endpoint in STRIPE_API_BASE (the local fake), else the real service. */
export function createStripeClient(
  opts: { apiBase?: string; secretKey?: string; maxNetworkRetries?: number } = {},
): Stripe {
  const env = getEnv();
  const base = opts.apiBase ?? env.STRIPE_API_BASE;
  const config: Stripe.StripeConfig = {
    maxNetworkRetries: opts.maxNetworkRetries ?? 2,
    timeout: 15_000,
    appInfo: { name: "Treadcast" },
  };
  if (base) {
    const url = new URL(base);
    config.host = url.hostname;
    config.protocol = url.protocol === "http:" ? "http" : "https";
    config.port = url.port ? Number(url.port) : url.protocol === "http:" ? 80 : 443;
  }
  return new Stripe(opts.secretKey ?? env.STRIPE_SECRET_KEY, config);
}

const globalForStripe = globalThis as unknown as { treadcastStripe?: Stripe };

export function getStripe(): Stripe {
  globalForStripe.treadcastStripe ??= createStripeClient();
  return globalForStripe.treadcastStripe;
}

export type TPlanPrice = {
  key: string;
  name: string;
  kind: "trial" | "pack" | "monthly" | "annual";
  currency: string;
  priceMinor: number;
};

/** The adapter's calls, each named for what billing needs of the provider. */
export function billingProvider(stripe: Stripe = getStripe()) {
  return {
    /** One provider customer per dealership; the key makes a retried create return the same one. */
    createCustomer: (opts: { dealershipId: string; name: string; email: string | null }) =>
      call(() =>
        stripe.customers.create(
          {
            name: opts.name,
            email: opts.email ?? undefined,
            metadata: { dealershipId: opts.dealershipId },
          },
          { idempotencyKey: `customer-${opts.dealershipId}` },
        ),
      ),

    updateCustomerEmail: (customerId: string, email: string) =>
      call(() => stripe.customers.update(customerId, { email })),

    /** The provider's price for a plan, found by lookup key or created the first time. */
    ensurePrice: (plan: TPlanPrice) =>
      call(async () => {
        const found = await stripe.prices.list({ lookup_keys: [plan.key], active: true, limit: 1 });
        if (found.data[0]) return found.data[0];
        return stripe.prices.create(
          {
            currency: plan.currency,
            unit_amount: plan.priceMinor,
            lookup_key: plan.key,
            nickname: plan.name,
            product_data: { name: plan.name },
            ...(plan.kind === "monthly" || plan.kind === "annual"
              ? { recurring: { interval: plan.kind === "monthly" ? "month" : "year" } }
              : {}),
          },
          { idempotencyKey: `price-${plan.key}-${plan.currency}-${plan.priceMinor}` },
        );
      }),

    createCheckoutSession: (opts: {
      customerId: string;
      priceId: string;
      mode: "subscription" | "payment";
      dealershipId: string;
      planKey: string;
      successUrl: string;
      cancelUrl: string;
    }) =>
      call(() =>
        stripe.checkout.sessions.create({
          mode: opts.mode,
          customer: opts.customerId,
          client_reference_id: opts.dealershipId,
          line_items: [{ price: opts.priceId, quantity: 1 }],
          success_url: opts.successUrl,
          cancel_url: opts.cancelUrl,
          metadata: { dealershipId: opts.dealershipId, planKey: opts.planKey },
          ...(opts.mode === "payment" ? { invoice_creation: { enabled: true } } : {}),
        }),
      ),

    retrieveCheckoutSession: (id: string) => call(() => stripe.checkout.sessions.retrieve(id)),

    createPortalSession: (customerId: string, returnUrl: string) =>
      call(() =>
        stripe.billingPortal.sessions.create({ customer: customerId, return_url: returnUrl }),
      ),

    retrieveSubscription: (id: string) => call(() => stripe.subscriptions.retrieve(id)),

    /** Upgrade or downgrade: proration credits unused time and charges the rest of the period. */
    changeSubscriptionPrice: (opts: { subscriptionId: string; itemId: string; priceId: string }) =>
      call(() =>
        stripe.subscriptions.update(opts.subscriptionId, {
          items: [{ id: opts.itemId, price: opts.priceId }],
          proration_behavior: "create_prorations",
        }),
      ),

    setCancelAtPeriodEnd: (subscriptionId: string, cancel: boolean) =>
      call(() => stripe.subscriptions.update(subscriptionId, { cancel_at_period_end: cancel })),

    listInvoices: (customerId: string, limit = 24) =>
      call(() => stripe.invoices.list({ customer: customerId, limit })),

    retrieveInvoice: (id: string) => call(() => stripe.invoices.retrieve(id)),

    /** The customer's cards, newest first. */
    listCards: (customerId: string) =>
      call(() => stripe.customers.listPaymentMethods(customerId, { type: "card", limit: 5 })),

    retrieveCustomer: (id: string) => call(() => stripe.customers.retrieve(id)),

    /** An overage charge, added to the next invoice; keyed by the use so it is charged once. */
    createOverageItem: (opts: {
      customerId: string;
      useId: string;
      amountMinor: number;
      currency: string;
      description: string;
    }) =>
      call(() =>
        stripe.invoiceItems.create(
          {
            customer: opts.customerId,
            amount: opts.amountMinor,
            currency: opts.currency,
            description: opts.description,
            metadata: { allowanceUseId: opts.useId },
          },
          { idempotencyKey: `overage-${opts.useId}` },
        ),
      ),

    /** Verifies a webhook's Stripe-Signature over the raw body; throws on a bad or stale one. */
    verifyWebhook: (rawBody: string, signature: string, secret: string) =>
      stripe.webhooks.constructEvent(rawBody, signature, secret),
  };
}

export type TBillingProvider = ReturnType<typeof billingProvider>;
