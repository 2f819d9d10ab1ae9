import qs from "qs";
import {
  cardCharges,
  createInvoice,
  periodEnd,
  priceOf,
  renewSubscription,
  type TFakeAnswer,
  type TFakeContext,
  type TFakeRequest,
} from "@/mocks/stripe/api";
import type { TObj } from "@/mocks/stripe/store";
import { invoicePdf } from "@/mocks/stripe/invoice-pdf";

/**
 * The fake's own hosted pages: a card form for checkout, a small account portal and invoice
 * PDFs. Plain HTML in our own words; nothing here imitates the real hosted pages.
 */
const esc = (s: unknown) => String(s ?? "").replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

const money = (minor: number, currency: string) =>
  new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(
    minor / 100,
  );

function page(title: string, body: string, status = 200): TFakeAnswer {
  return {
    status,
    headers: { "content-type": "text/html; charset=utf-8" },
    body: `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(title)}</title>
<style>body{font-family:system-ui,sans-serif;background:#f4f1ea;color:#222;margin:0}main{max-width:30rem;margin:2rem auto;background:#fff;padding:1.5rem;border:1px solid #d8d2c4;border-radius:6px}
h1{font-size:1.3rem;margin-top:0}label{display:block;margin:.8rem 0 .2rem;font-weight:600}input{width:100%;box-sizing:border-box;padding:.6rem;font-size:1rem;border:1px solid #999;border-radius:4px}
button{margin-top:1rem;padding:.7rem 1.2rem;font-size:1rem;background:#1d5c4a;color:#fff;border:0;border-radius:4px;cursor:pointer}.secondary{background:#fff;color:#1d5c4a;border:1px solid #1d5c4a}
.note{font-size:.85rem;color:#555}.error{background:#fbe9e7;border:1px solid #c0392b;color:#7b1d12;padding:.7rem;border-radius:4px}.ok{background:#e6f4ea;border:1px solid #2e7d32;padding:.7rem;border-radius:4px}table{width:100%;border-collapse:collapse}td{padding:.3rem 0;border-bottom:1px solid #eee}</style></head>
<body><main><p class="note">Local test payments: a stand-in for the card processor. No real money moves.</p>${body}</main></body></html>`,
  };
}

const notFoundPage = () =>
  page("Not found", "<h1>This page has expired or never existed.</h1>", 404);

type TCardOutcome =
  | { ok: true; last4: string; brand: string; expMonth: number; expYear: number }
  | { ok: false; message: string };

/**
 * Stripe's documented test cards: 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is
 * declined, 4000 0000 0000 0341 attaches but fails when charged later.
 */
export function readCard(form: Record<string, unknown>): TCardOutcome {
  const number = String(form.card_number ?? "").replace(/[\s-]/g, "");
  const expiry = String(form.card_expiry ?? "").replace(/\s/g, "");
  const cvc = String(form.card_cvc ?? "").trim();
  const m = /^(\d{1,2})\/(\d{2}|\d{4})$/.exec(expiry);
  if (!/^\d{16}$/.test(number)) return { ok: false, message: "Enter the 16-digit card number." };
  if (!m) return { ok: false, message: "Enter the expiry date as MM/YY." };
  if (!/^\d{3,4}$/.test(cvc))
    return { ok: false, message: "Enter the 3 or 4 digit security code." };
  const expMonth = Number(m[1]);
  const expYear = m[2]!.length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (number === "4000000000000002")
    return { ok: false, message: "Your card was declined. Nothing was charged. Try another card." };
  if (number !== "4242424242424242" && number !== "4000000000000341")
    return {
      ok: false,
      message:
        "This test page only takes the test cards 4242 4242 4242 4242 (succeeds) and 4000 0000 0000 0002 (declined).",
    };
  return { ok: true, last4: number.slice(-4), brand: "visa", expMonth, expYear };
}

function cardFields(): string {
  return `<label for="card_number">Card number</label><input id="card_number" name="card_number" inputmode="numeric" autocomplete="off" placeholder="4242 4242 4242 4242">
<label for="card_expiry">Expiry (MM/YY)</label><input id="card_expiry" name="card_expiry" placeholder="12/34">
<label for="card_cvc">Security code</label><input id="card_cvc" name="card_cvc" inputmode="numeric" placeholder="123">`;
}

function attachCard(
  ctx: TFakeContext,
  customerId: string,
  card: TCardOutcome & { ok: true },
): TObj {
  const pm = ctx.store.put({
    id: ctx.store.newId("pm"),
    object: "payment_method",
    type: "card",
    customer: customerId,
    card: {
      brand: card.brand,
      last4: card.last4,
      exp_month: card.expMonth,
      exp_year: card.expYear,
    },
    created: Math.floor(ctx.now() / 1000),
  });
  const customer = ctx.store.get(customerId)!;
  customer.invoice_settings = { default_payment_method: pm.id };
  ctx.emit("payment_method.attached", pm);
  return pm;
}

function ensureCustomer(ctx: TFakeContext, session: TObj): string {
  if (session.customer) return String(session.customer);
  const customer = ctx.store.put({
    id: ctx.store.newId("cus"),
    object: "customer",
    email: session.customer_email ?? null,
    name: null,
    metadata: {},
    invoice_settings: { default_payment_method: null },
    created: Math.floor(ctx.now() / 1000),
    livemode: false,
  });
  ctx.emit("customer.created", customer);
  return customer.id;
}

function completeCheckout(ctx: TFakeContext, session: TObj, card: TCardOutcome & { ok: true }) {
  const nowS = Math.floor(ctx.now() / 1000);
  const customerId = ensureCustomer(ctx, session);
  session.customer = customerId;
  const pm = attachCard(ctx, customerId, card);
  const items = session._items as { price: string; quantity: number }[];
  const price = priceOf(ctx, items[0]!.price);
  let invoice: TObj;
  if (session.mode === "subscription") {
    const interval = (price.recurring as { interval: string }).interval;
    const end = periodEnd(nowS, interval);
    const sub = ctx.store.put({
      id: ctx.store.newId("sub"),
      object: "subscription",
      customer: customerId,
      status: "active",
      cancel_at_period_end: false,
      canceled_at: null,
      ended_at: null,
      default_payment_method: pm.id,
      metadata: session.metadata ?? {},
      items: {
        object: "list",
        data: [
          {
            id: ctx.store.newId("si"),
            object: "subscription_item",
            price,
            quantity: items[0]!.quantity,
            current_period_start: nowS,
            current_period_end: end,
          },
        ],
      },
      latest_invoice: null as string | null,
      created: nowS,
      livemode: false,
    });
    invoice = createInvoice(ctx, {
      customer: customerId,
      subscription: sub.id,
      currency: String(price.currency),
      lines: [{ description: String(price.nickname), amount: Number(price.unit_amount) }],
      periodStart: nowS,
      periodEnd: end,
      paid: true,
    });
    sub.latest_invoice = invoice.id;
    session.subscription = sub.id;
    ctx.emit("customer.subscription.created", sub);
  } else {
    invoice = createInvoice(ctx, {
      customer: customerId,
      currency: String(price.currency),
      lines: items.map((i) => ({
        description: String(priceOf(ctx, i.price).nickname),
        amount: Number(priceOf(ctx, i.price).unit_amount) * i.quantity,
      })),
      periodStart: nowS,
      periodEnd: nowS,
      paid: true,
    });
  }
  session.invoice = invoice.id;
  session.status = "complete";
  session.payment_status = "paid";
  ctx.emit("checkout.session.completed", session);
  ctx.emit("invoice.paid", invoice);
}

function checkoutPage(ctx: TFakeContext, session: TObj, error?: string): TFakeAnswer {
  const items = session._items as { price: string; quantity: number }[];
  const price = priceOf(ctx, items[0]!.price);
  const every = price.recurring
    ? ` every ${(price.recurring as { interval: string }).interval}`
    : "";
  return page(
    "Pay for your Treadcast plan",
    `<h1>Pay for ${esc(price.nickname)}</h1>
<p><strong>${esc(money(Number(session.amount_total), String(session.currency)))}</strong>${esc(every)}</p>
${error ? `<p class="error" role="alert">${esc(error)}</p>` : ""}
<form method="post">${cardFields()}<button type="submit">Pay now</button></form>
${session.cancel_url ? `<p><a href="${esc(session.cancel_url)}">Cancel and go back to Treadcast</a></p>` : ""}
<p class="note">Test cards: 4242 4242 4242 4242 succeeds; 4000 0000 0000 0002 is declined. Any future expiry and any 3 digits.</p>`,
    error ? 402 : 200,
  );
}

function redirect(url: string): TFakeAnswer {
  return { status: 303, headers: { location: url }, body: "" };
}

function portalPage(ctx: TFakeContext, session: TObj, notice?: { ok: boolean; text: string }) {
  const customer = ctx.store.get(String(session.customer))!;
  const settings = customer.invoice_settings as { default_payment_method?: string | null };
  const pm = settings.default_payment_method
    ? ctx.store.get(settings.default_payment_method)
    : undefined;
  const card = pm?.card as { last4: string; exp_month: number; exp_year: number } | undefined;
  const subs = ctx.store
    .all("subscription")
    .filter((s) => s.customer === customer.id && s.status !== "canceled");
  const invoices = ctx.store.all("invoice").filter((i) => i.customer === customer.id);
  const subRows = subs
    .map((s) => {
      const item = (s.items as { data: TObj[] }).data[0]!;
      const price = item.price as TObj;
      const ends = new Date(Number(item.current_period_end) * 1000).toUTCString().slice(5, 16);
      return `<tr><td>${esc(price.nickname)} (${esc(s.status)})</td><td>${
        s.cancel_at_period_end ? `ends ${esc(ends)}` : `renews ${esc(ends)}`
      }</td><td><form method="post"><input type="hidden" name="action" value="${
        s.cancel_at_period_end ? "resume" : "cancel"
      }"><input type="hidden" name="subscription" value="${esc(s.id)}"><button class="secondary" type="submit">${
        s.cancel_at_period_end ? "Keep the plan" : "Stop at period end"
      }</button></form></td></tr>`;
    })
    .join("");
  return page(
    "Your payment details",
    `<h1>Payment details for ${esc(customer.email ?? customer.id)}</h1>
${notice ? `<p class="${notice.ok ? "ok" : "error"}" role="${notice.ok ? "status" : "alert"}">${esc(notice.text)}</p>` : ""}
<h2>Card on file</h2><p>${card ? `Card ending ${esc(card.last4)}, expires ${esc(card.exp_month)}/${esc(card.exp_year)}` : "No card on file."}</p>
<form method="post"><input type="hidden" name="action" value="card">${cardFields()}<button type="submit">Save this card</button></form>
<h2>Plans</h2>${subRows ? `<table>${subRows}</table>` : "<p>No running plan.</p>"}
<h2>Invoices</h2>${
      invoices.length
        ? `<table>${invoices
            .map(
              (i) =>
                `<tr><td>${esc(i.number)}</td><td>${esc(money(Number(i.total), String(i.currency)))}</td><td>${esc(i.status)}</td><td><a href="${esc(i.invoice_pdf)}">PDF</a></td></tr>`,
            )
            .join("")}</table>`
        : "<p>No invoices yet.</p>"
    }
${session.return_url ? `<p><a href="${esc(session.return_url)}">Back to Treadcast</a></p>` : ""}`,
    notice && !notice.ok ? 402 : 200,
  );
}

function portalAction(ctx: TFakeContext, session: TObj, form: Record<string, unknown>) {
  const customerId = String(session.customer);
  if (form.action === "card") {
    const card = readCard(form);
    if (!card.ok) return portalPage(ctx, session, { ok: false, text: card.message });
    attachCard(ctx, customerId, card);
    // A past-due subscription is retried on the new card at once, as a dunning retry would.
    for (const sub of ctx.store.all("subscription")) {
      if (sub.customer !== customerId || sub.status !== "past_due") continue;
      const invoice = sub.latest_invoice ? ctx.store.get(String(sub.latest_invoice)) : undefined;
      if (
        invoice &&
        invoice.status === "open" &&
        cardCharges(
          ctx.store.get(
            String(
              (ctx.store.get(customerId)!.invoice_settings as { default_payment_method: string })
                .default_payment_method,
            ),
          ),
        )
      ) {
        invoice.status = "paid";
        invoice.amount_paid = invoice.amount_due;
        invoice.amount_remaining = 0;
        sub.status = "active";
        ctx.emit("invoice.paid", invoice);
        ctx.emit("customer.subscription.updated", sub);
      }
    }
    return portalPage(ctx, session, { ok: true, text: `Card ending ${card.last4} saved.` });
  }
  const sub = ctx.store.get(String(form.subscription ?? ""));
  if (!sub || sub.customer !== customerId || sub.object !== "subscription") return notFoundPage();
  sub.cancel_at_period_end = form.action === "cancel";
  sub.canceled_at = form.action === "cancel" ? Math.floor(ctx.now() / 1000) : null;
  ctx.emit("customer.subscription.updated", sub);
  return portalPage(ctx, session, {
    ok: true,
    text:
      form.action === "cancel"
        ? "The plan stops at the end of this period."
        : "The plan keeps running.",
  });
}

/** Answers the hosted pages; null when the path is not one of them. */
export async function handlePageRequest(
  ctx: TFakeContext,
  req: TFakeRequest,
): Promise<TFakeAnswer | null> {
  const form = req.method === "POST" ? (qs.parse(req.body) as Record<string, unknown>) : {};
  let m = /^\/checkout\/([^/]+)$/.exec(req.path);
  if (m) {
    const session = ctx.store.get(m[1]!);
    if (!session || session.object !== "checkout.session") return notFoundPage();
    if (session.status === "complete")
      return req.method === "POST"
        ? redirect(String(session.success_url).replace("{CHECKOUT_SESSION_ID}", session.id))
        : page("Already paid", `<h1>This payment is complete.</h1>`);
    if (req.method !== "POST") return checkoutPage(ctx, session);
    const card = readCard(form);
    if (!card.ok) return checkoutPage(ctx, session, card.message);
    completeCheckout(ctx, session, card);
    ctx.store.save();
    return redirect(String(session.success_url).replace("{CHECKOUT_SESSION_ID}", session.id));
  }
  m = /^\/portal\/([^/]+)$/.exec(req.path);
  if (m) {
    const session = ctx.store.get(m[1]!);
    if (!session || session.object !== "billing_portal.session") return notFoundPage();
    if (req.method !== "POST") return portalPage(ctx, session);
    const answer = portalAction(ctx, session, form);
    ctx.store.save();
    return answer;
  }
  m = /^\/invoices\/([^/]+)(\/pdf)?$/.exec(req.path);
  if (m) {
    const invoice = ctx.store.get(m[1]!);
    if (!invoice || invoice.object !== "invoice") return notFoundPage();
    if (m[2]) {
      return {
        status: 200,
        headers: {
          "content-type": "application/pdf",
          "content-disposition": `inline; filename="${String(invoice.number)}.pdf"`,
        },
        body: await invoicePdf(invoice),
      };
    }
    return page(
      `Invoice ${String(invoice.number)}`,
      `<h1>Invoice ${esc(invoice.number)}</h1><p>${esc(money(Number(invoice.total), String(invoice.currency)))}, ${esc(invoice.status)}</p><p><a href="${esc(invoice.invoice_pdf)}">Download PDF</a></p>`,
    );
  }
  // Test control: bill the next period now (time passing, for tests and demos).
  m = /^\/_fake\/subscriptions\/([^/]+)\/renew$/.exec(req.path);
  if (m && req.method === "POST") {
    const sub = ctx.store.get(m[1]!);
    if (!sub || sub.object !== "subscription") return notFoundPage();
    renewSubscription(ctx, sub);
    ctx.store.save();
    return { status: 200, body: sub };
  }
  return null;
}
