import { createHash } from "node:crypto";
import qs from "qs";
import type { FakeStore, TObj } from "@/mocks/stripe/store";

/**
 * The part of the Stripe API the billing adapter uses, answered from the fake's store: form-
 * encoded bodies, Bearer keys, Stripe's error JSON and idempotency keys. Pure request → answer,
 * so the HTTP server and the msw handlers share it.
 */
export type TFakeRequest = {
  method: string;
  path: string;
  query: string;
  headers: Headers;
  body: string;
};
export type TFakeAnswer = { status: number; body: unknown; headers?: Record<string, string> };

export type TFakeContext = {
  store: FakeStore;
  /** Where the hosted pages live, for checkout, portal and invoice URLs. */
  publicUrl: string;
  /** Records an event and schedules its delivery. */
  emit: (type: string, object: TObj) => void;
  now: () => number;
};

type TParams = Record<string, unknown>;

export class FakeError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

const missing = (kind: string, id: string) =>
  new FakeError(404, "invalid_request_error", `No such ${kind}: '${id}'`, {
    code: "resource_missing",
    param: "id",
  });

export function errorBody(e: FakeError) {
  return { error: { type: e.type, message: e.message, ...e.extra } };
}

const seconds = (ctx: TFakeContext) => Math.floor(ctx.now() / 1000);

function str(v: unknown): string | undefined {
  return typeof v === "string" ? v : undefined;
}

function bool(v: unknown): boolean | undefined {
  return v === "true" ? true : v === "false" ? false : undefined;
}

function required(params: TParams, name: string): string {
  const v = str(params[name]);
  if (!v)
    throw new FakeError(400, "invalid_request_error", `Missing required param: ${name}.`, {
      code: "parameter_missing",
      param: name,
    });
  return v;
}

function getOr404(ctx: TFakeContext, kind: string, id: string): TObj {
  const obj = ctx.store.get(id);
  if (!obj || obj.object !== kind) throw missing(kind.replace(/^.*\./, ""), id);
  return obj;
}

/** Newest first, as the real API lists; within one second, the later-made object first. */
function list(data: TObj[], url: string, limit = 10) {
  const sorted = data
    .map((o, i) => ({ o, i }))
    .sort((a, b) => Number(b.o.created ?? 0) - Number(a.o.created ?? 0) || b.i - a.i)
    .map(({ o }) => o);
  return {
    object: "list",
    data: sorted.slice(0, limit),
    has_more: sorted.length > limit,
    url,
  };
}

// ── Billing arithmetic shared with the hosted pages ─────────────────────────────────────────

const INTERVAL_SECONDS: Record<string, number> = { month: 30 * 86_400, year: 365 * 86_400 };

export function periodEnd(start: number, interval: string): number {
  const d = new Date(start * 1000);
  if (interval === "year") d.setUTCFullYear(d.getUTCFullYear() + 1);
  else d.setUTCMonth(d.getUTCMonth() + 1);
  return Math.floor(d.getTime() / 1000);
}

export function priceOf(ctx: TFakeContext, id: string): TObj {
  return getOr404(ctx, "price", id);
}

/** Creates a paid or open invoice from lines, pulling in the customer's pending invoice items. */
export function createInvoice(
  ctx: TFakeContext,
  opts: {
    customer: string;
    subscription?: string;
    currency: string;
    lines: { description: string; amount: number }[];
    periodStart: number;
    periodEnd: number;
    paid: boolean;
  },
): TObj {
  const pending = ctx.store
    .all("invoiceitem")
    .filter((ii) => ii.customer === opts.customer && !ii.invoice);
  const id = ctx.store.newId("in");
  for (const ii of pending) ii.invoice = id;
  const lines = [
    ...opts.lines,
    ...pending.map((ii) => ({ description: String(ii.description), amount: Number(ii.amount) })),
  ];
  const total = Math.max(
    0,
    lines.reduce((s, l) => s + l.amount, 0),
  );
  const count = ctx.store.all("invoice").length + 1;
  return ctx.store.put({
    id,
    object: "invoice",
    customer: opts.customer,
    parent: opts.subscription
      ? { type: "subscription_details", subscription_details: { subscription: opts.subscription } }
      : null,
    number: `TC-${String(count).padStart(5, "0")}`,
    currency: opts.currency,
    amount_due: total,
    amount_paid: opts.paid ? total : 0,
    amount_remaining: opts.paid ? 0 : total,
    total,
    status: opts.paid ? "paid" : "open",
    lines: {
      object: "list",
      data: lines.map((l, i) => ({ id: `il_${id}_${i}`, object: "line_item", ...l })),
      has_more: false,
    },
    period_start: opts.periodStart,
    period_end: opts.periodEnd,
    hosted_invoice_url: `${ctx.publicUrl}/invoices/${id}`,
    invoice_pdf: `${ctx.publicUrl}/invoices/${id}/pdf`,
    created: seconds(ctx),
    livemode: false,
  });
}

function defaultCard(ctx: TFakeContext, customerId: string): TObj | undefined {
  const customer = ctx.store.get(customerId);
  const settings = customer?.invoice_settings as { default_payment_method?: string } | undefined;
  return settings?.default_payment_method
    ? ctx.store.get(settings.default_payment_method)
    : undefined;
}

/** Cards that attach but fail when charged (Stripe's documented 4000 0000 0000 0341). */
export function cardCharges(card: TObj | undefined): boolean {
  const last4 = (card?.card as { last4?: string } | undefined)?.last4;
  return Boolean(card) && last4 !== "0341";
}

/**
 * Bills the subscription's next period (the fake's stand-in for time passing): a cancel at
 * period end ends it; otherwise the default card is charged, or the subscription goes past due.
 */
export function renewSubscription(ctx: TFakeContext, sub: TObj): TObj {
  const item = (sub.items as { data: TObj[] }).data[0]!;
  if (sub.cancel_at_period_end) {
    sub.status = "canceled";
    sub.canceled_at = seconds(ctx);
    sub.ended_at = seconds(ctx);
    ctx.emit("customer.subscription.deleted", sub);
    return sub;
  }
  const price = priceOf(ctx, String((item.price as TObj).id));
  const start = Number(item.current_period_end);
  const end = periodEnd(start, String((price.recurring as { interval: string }).interval));
  const paid = cardCharges(defaultCard(ctx, String(sub.customer)));
  const invoice = createInvoice(ctx, {
    customer: String(sub.customer),
    subscription: sub.id,
    currency: String(price.currency),
    lines: [
      { description: String(price.nickname ?? "Subscription"), amount: Number(price.unit_amount) },
    ],
    periodStart: start,
    periodEnd: end,
    paid,
  });
  item.current_period_start = start;
  item.current_period_end = end;
  sub.latest_invoice = invoice.id;
  sub.status = paid ? "active" : "past_due";
  ctx.emit(paid ? "invoice.paid" : "invoice.payment_failed", invoice);
  ctx.emit("customer.subscription.updated", sub);
  return sub;
}

// ── Endpoints ───────────────────────────────────────────────────────────────────────────────

function createCustomer(ctx: TFakeContext, p: TParams): TObj {
  const customer = ctx.store.put({
    id: ctx.store.newId("cus"),
    object: "customer",
    email: str(p.email) ?? null,
    name: str(p.name) ?? null,
    metadata: (p.metadata as TParams) ?? {},
    invoice_settings: { default_payment_method: null },
    created: seconds(ctx),
    livemode: false,
  });
  ctx.emit("customer.created", customer);
  return customer;
}

function updateCustomer(ctx: TFakeContext, id: string, p: TParams): TObj {
  const customer = getOr404(ctx, "customer", id);
  if (p.email !== undefined) customer.email = str(p.email) || null;
  if (p.name !== undefined) customer.name = str(p.name) || null;
  if (p.metadata)
    customer.metadata = { ...(customer.metadata as TParams), ...(p.metadata as TParams) };
  ctx.emit("customer.updated", customer);
  return customer;
}

function createPrice(ctx: TFakeContext, p: TParams): TObj {
  const productData = p.product_data as TParams | undefined;
  const currency = required(p, "currency");
  const unitAmount = Number(required(p, "unit_amount"));
  if (!Number.isInteger(unitAmount) || unitAmount < 0)
    throw new FakeError(400, "invalid_request_error", "Invalid integer: unit_amount", {
      param: "unit_amount",
    });
  const lookupKey = str(p.lookup_key);
  if (lookupKey && ctx.store.all("price").some((x) => x.lookup_key === lookupKey && x.active))
    throw new FakeError(
      400,
      "invalid_request_error",
      `A price (\`${lookupKey}\`) already uses that lookup key.`,
      { param: "lookup_key" },
    );
  let product = str(p.product);
  if (!product) {
    const prod = ctx.store.put({
      id: ctx.store.newId("prod"),
      object: "product",
      name: str(productData?.name) ?? "Product",
      created: seconds(ctx),
    });
    product = prod.id;
  }
  const recurring = p.recurring as TParams | undefined;
  return ctx.store.put({
    id: ctx.store.newId("price"),
    object: "price",
    active: true,
    currency,
    unit_amount: unitAmount,
    lookup_key: lookupKey ?? null,
    nickname: str(p.nickname) ?? str(productData?.name) ?? null,
    product,
    type: recurring ? "recurring" : "one_time",
    recurring: recurring
      ? { interval: str(recurring.interval) ?? "month", interval_count: 1 }
      : null,
    metadata: (p.metadata as TParams) ?? {},
    created: seconds(ctx),
  });
}

function createCheckoutSession(ctx: TFakeContext, p: TParams): TObj {
  const mode = required(p, "mode");
  if (mode !== "subscription" && mode !== "payment")
    throw new FakeError(400, "invalid_request_error", `Invalid mode: ${mode}`, { param: "mode" });
  const lineItems = (p.line_items as TParams[] | undefined) ?? [];
  if (!lineItems.length)
    throw new FakeError(400, "invalid_request_error", "Missing required param: line_items.", {
      param: "line_items",
    });
  const items = lineItems.map((li) => {
    const price = priceOf(ctx, required(li, "price"));
    const recurring = price.type === "recurring";
    if (recurring !== (mode === "subscription"))
      throw new FakeError(
        400,
        "invalid_request_error",
        mode === "subscription"
          ? "You must provide at least one recurring price in `subscription` mode when using prices."
          : "You specified `payment` mode but passed a recurring price.",
        { param: "line_items" },
      );
    return { price: price.id, quantity: Number(li.quantity ?? 1) };
  });
  const customer = str(p.customer);
  if (customer) getOr404(ctx, "customer", customer);
  const id = ctx.store.newId("cs_test");
  const amount = items.reduce(
    (s, i) => s + Number(priceOf(ctx, i.price).unit_amount) * i.quantity,
    0,
  );
  return ctx.store.put({
    id,
    object: "checkout.session",
    mode,
    status: "open",
    payment_status: "unpaid",
    customer: customer ?? null,
    customer_email: str(p.customer_email) ?? null,
    client_reference_id: str(p.client_reference_id) ?? null,
    success_url: required(p, "success_url"),
    cancel_url: str(p.cancel_url) ?? null,
    metadata: (p.metadata as TParams) ?? {},
    subscription: null,
    invoice: null,
    amount_total: amount,
    currency: String(priceOf(ctx, items[0]!.price).currency),
    url: `${ctx.publicUrl}/checkout/${id}`,
    created: seconds(ctx),
    expires_at: seconds(ctx) + 86_400,
    livemode: false,
    // Kept for the hosted page; the real API returns line items from a separate endpoint.
    _items: items,
  });
}

function createPortalSession(ctx: TFakeContext, p: TParams): TObj {
  const customer = getOr404(ctx, "customer", required(p, "customer"));
  const id = ctx.store.newId("bps");
  return ctx.store.put({
    id,
    object: "billing_portal.session",
    customer: customer.id,
    return_url: str(p.return_url) ?? null,
    url: `${ctx.publicUrl}/portal/${id}`,
    created: seconds(ctx),
    livemode: false,
  });
}

function updateSubscription(ctx: TFakeContext, id: string, p: TParams): TObj {
  const sub = getOr404(ctx, "subscription", id);
  if (sub.status === "canceled")
    throw new FakeError(
      400,
      "invalid_request_error",
      "A canceled subscription can only update its cancellation_details and metadata.",
    );
  const cancel = bool(p.cancel_at_period_end);
  if (cancel !== undefined) {
    sub.cancel_at_period_end = cancel;
    sub.canceled_at = cancel ? seconds(ctx) : null;
  }
  const items = p.items as TParams[] | undefined;
  if (items?.length) {
    const item = (sub.items as { data: TObj[] }).data[0]!;
    const next = priceOf(ctx, required(items[0]!, "price"));
    const old = priceOf(ctx, String((item.price as TObj).id));
    const behaviour = str(p.proration_behavior) ?? "create_prorations";
    const nowS = seconds(ctx);
    const start = Number(item.current_period_start);
    const end = Number(item.current_period_end);
    const oldInterval = (old.recurring as { interval: string }).interval;
    const nextInterval = (next.recurring as { interval: string }).interval;
    const unused = end > start ? Math.max(0, (end - nowS) / (end - start)) : 0;
    const credit = -Math.round(Number(old.unit_amount) * unused);
    item.price = next;
    if (oldInterval !== nextInterval) {
      // A new interval restarts the billing cycle now and invoices at once, as the real API does.
      item.current_period_start = nowS;
      item.current_period_end = periodEnd(nowS, nextInterval);
      const paid = cardCharges(defaultCard(ctx, String(sub.customer)));
      const invoice = createInvoice(ctx, {
        customer: String(sub.customer),
        subscription: sub.id,
        currency: String(next.currency),
        lines: [
          ...(behaviour === "none"
            ? []
            : [{ description: `Unused time on ${old.nickname}`, amount: credit }]),
          { description: String(next.nickname), amount: Number(next.unit_amount) },
        ],
        periodStart: nowS,
        periodEnd: Number(item.current_period_end),
        paid,
      });
      sub.latest_invoice = invoice.id;
      sub.status = paid ? "active" : "past_due";
      ctx.emit(paid ? "invoice.paid" : "invoice.payment_failed", invoice);
    } else if (behaviour !== "none") {
      const charge = Math.round(Number(next.unit_amount) * unused);
      for (const [description, amount] of [
        [`Unused time on ${old.nickname}`, credit],
        [`Remaining time on ${next.nickname}`, charge],
      ] as const) {
        ctx.store.put({
          id: ctx.store.newId("ii"),
          object: "invoiceitem",
          customer: sub.customer,
          amount,
          currency: next.currency,
          description,
          proration: true,
          invoice: null,
          date: nowS,
        });
      }
    }
  }
  if (p.metadata) sub.metadata = { ...(sub.metadata as TParams), ...(p.metadata as TParams) };
  ctx.emit("customer.subscription.updated", sub);
  return sub;
}

function createInvoiceItem(ctx: TFakeContext, p: TParams): TObj {
  const customer = getOr404(ctx, "customer", required(p, "customer"));
  const amount = Number(required(p, "amount"));
  if (!Number.isInteger(amount))
    throw new FakeError(400, "invalid_request_error", "Invalid integer: amount", {
      param: "amount",
    });
  return ctx.store.put({
    id: ctx.store.newId("ii"),
    object: "invoiceitem",
    customer: customer.id,
    amount,
    currency: required(p, "currency"),
    description: str(p.description) ?? null,
    metadata: (p.metadata as TParams) ?? {},
    proration: false,
    invoice: null,
    date: seconds(ctx),
  });
}

function byCustomer(ctx: TFakeContext, object: string, query: TParams): TObj[] {
  const customer = str(query.customer);
  return ctx.store.all(object).filter((o) => !customer || o.customer === customer);
}

type TRoute = [
  method: string,
  pattern: RegExp,
  run: (ctx: TFakeContext, m: string[], p: TParams) => unknown,
];

const ROUTES: TRoute[] = [
  ["POST", /^\/v1\/customers$/, (c, _m, p) => createCustomer(c, p)],
  ["GET", /^\/v1\/customers\/([^/]+)$/, (c, m) => getOr404(c, "customer", m[1]!)],
  ["POST", /^\/v1\/customers\/([^/]+)$/, (c, m, p) => updateCustomer(c, m[1]!, p)],
  [
    "GET",
    /^\/v1\/customers\/([^/]+)\/payment_methods$/,
    (c, m, p) => {
      getOr404(c, "customer", m[1]!);
      return list(
        byCustomer(c, "payment_method", { customer: m[1] }),
        `/v1/customers/${m[1]}/payment_methods`,
        Number(p.limit ?? 10),
      );
    },
  ],
  [
    "GET",
    /^\/v1\/prices$/,
    (c, _m, p) => {
      const keys = (p.lookup_keys as string[] | undefined) ?? [];
      const prices = c.store
        .all("price")
        .filter((x) => x.active && (!keys.length || keys.includes(String(x.lookup_key))));
      return list(prices, "/v1/prices", Number(p.limit ?? 10));
    },
  ],
  ["POST", /^\/v1\/prices$/, (c, _m, p) => createPrice(c, p)],
  ["POST", /^\/v1\/checkout\/sessions$/, (c, _m, p) => createCheckoutSession(c, p)],
  ["GET", /^\/v1\/checkout\/sessions\/([^/]+)$/, (c, m) => getOr404(c, "checkout.session", m[1]!)],
  ["POST", /^\/v1\/billing_portal\/sessions$/, (c, _m, p) => createPortalSession(c, p)],
  ["GET", /^\/v1\/subscriptions\/([^/]+)$/, (c, m) => getOr404(c, "subscription", m[1]!)],
  ["POST", /^\/v1\/subscriptions\/([^/]+)$/, (c, m, p) => updateSubscription(c, m[1]!, p)],
  [
    "GET",
    /^\/v1\/invoices$/,
    (c, _m, p) => list(byCustomer(c, "invoice", p), "/v1/invoices", Number(p.limit ?? 10)),
  ],
  ["GET", /^\/v1\/invoices\/([^/]+)$/, (c, m) => getOr404(c, "invoice", m[1]!)],
  ["POST", /^\/v1\/invoiceitems$/, (c, _m, p) => createInvoiceItem(c, p)],
  ["GET", /^\/v1\/events\/([^/]+)$/, (c, m) => getOr404(c, "event", m[1]!)],
];

/** Strips the fake's private fields (leading underscore) from an answer. */
function publicView(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(publicView);
  if (value && typeof value === "object") {
    return Object.fromEntries(
      Object.entries(value as Record<string, unknown>)
        .filter(([k]) => !k.startsWith("_"))
        .map(([k, v]) => [k, publicView(v)]),
    );
  }
  return value;
}

/** Answers one API request. Mutations are saved before the answer goes out. */
export function handleApiRequest(ctx: TFakeContext, req: TFakeRequest): TFakeAnswer {
  const auth = req.headers.get("authorization") ?? "";
  const key = /^Bearer (\S+)$/.exec(auth)?.[1];
  if (!key || !/^sk_test_/.test(key)) {
    return {
      status: 401,
      body: {
        error: {
          type: "invalid_request_error",
          message: key
            ? `Invalid API Key provided: ${key.slice(0, 8)}****`
            : "You did not provide an API key. Provide it in the Authorization header as a Bearer token.",
        },
      },
    };
  }
  const route = ROUTES.find(([method, pattern]) => method === req.method && pattern.test(req.path));
  if (!route) {
    return {
      status: 404,
      body: {
        error: {
          type: "invalid_request_error",
          message: `Unrecognized request URL (${req.method}: ${req.path}).`,
        },
      },
    };
  }
  const params = qs.parse(req.method === "GET" ? req.query : req.body, { depth: 8 }) as TParams;
  const idemKey = req.method === "POST" ? req.headers.get("idempotency-key") : null;
  const fingerprint = createHash("sha256").update(`${req.path}\n${req.body}`).digest("hex");
  if (idemKey) {
    const seen = ctx.store.state.idempotency[idemKey];
    if (seen) {
      if (seen.fingerprint !== fingerprint) {
        return {
          status: 400,
          body: {
            error: {
              type: "idempotency_error",
              message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idemKey}' if you meant to execute a different request.`,
            },
          },
        };
      }
      return {
        status: seen.status,
        body: seen.body,
        headers: { "idempotent-replayed": "true", "idempotency-key": idemKey },
      };
    }
  }
  let answer: TFakeAnswer;
  try {
    const match = route[1].exec(req.path)!;
    answer = { status: 200, body: publicView(route[2](ctx, match, params)) };
  } catch (e) {
    if (!(e instanceof FakeError)) throw e;
    answer = { status: e.status, body: errorBody(e) };
  }
  if (idemKey) ctx.store.state.idempotency[idemKey] = { fingerprint, ...answer };
  if (req.method === "POST") ctx.store.save();
  return idemKey ? { ...answer, headers: { "idempotency-key": idemKey } } : answer;
}

export { INTERVAL_SECONDS };
