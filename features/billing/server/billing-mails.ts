// Billing e-mails, sent once each (billing_mail_log) through the app's mail transport.
import { and, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingAccounts, billingMailLog, dealerships, memberships, users } from "@/db/schema";
import { getEnv } from "@/lib/env";
import { formatMoney } from "@/lib/billing/money";
import type { TMailSender } from "@/features/billing/server/deps";

type TMail = Parameters<TMailSender["send"]>[0];

/** The billing address, else every billing and dealer admin of the dealership. */
async function recipients(db: Db, dealershipId: string): Promise<string[]> {
  const [account] = await db
    .select({ email: billingAccounts.billingEmail })
    .from(billingAccounts)
    .where(eq(billingAccounts.dealershipId, dealershipId));
  if (account?.email) return [account.email];
  const admins = await db
    .selectDistinct({ email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.dealershipId, dealershipId),
        inArray(memberships.role, ["billing_admin", "dealer_admin"]),
      ),
    );
  return admins.map((a) => a.email);
}

function mail(to: string, subject: string, paragraphs: string[]): TMail {
  const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
  return {
    to,
    subject,
    text: `${paragraphs.join("\n\n")}\n\n— Treadcast`,
    html: `${paragraphs.map((p) => `<p>${esc(p)}</p>`).join("")}<p>— Treadcast</p>`,
  };
}

/** Sends a billing mail once per key; a retried job finds the log row and sends nothing. */
async function sendOnce(
  { db, mailer }: { db: Db; mailer: TMailSender },
  opts: { key: string; dealershipId: string; kind: string; subject: string; body: string[] },
): Promise<boolean> {
  const [logged] = await db
    .insert(billingMailLog)
    .values({ key: opts.key, dealershipId: opts.dealershipId, kind: opts.kind })
    .onConflictDoNothing()
    .returning();
  if (!logged) return false;
  try {
    for (const to of await recipients(db, opts.dealershipId)) {
      await mailer.send(mail(to, opts.subject, opts.body));
    }
    return true;
  } catch (error) {
    // Let the job retry the mail later.
    await db.delete(billingMailLog).where(eq(billingMailLog.key, opts.key));
    throw error;
  }
}

async function dealershipName(db: Db, id: string): Promise<string> {
  const [d] = await db
    .select({ name: dealerships.name })
    .from(dealerships)
    .where(eq(dealerships.id, id));
  return d?.name ?? "your dealership";
}

const billingUrl = () => `${getEnv().APP_URL}/billing`;

export async function sendReceiptMail(
  deps: { db: Db; mailer: TMailSender },
  opts: {
    dealershipId: string;
    invoiceId: string;
    number: string;
    amountMinor: number;
    currency: string;
    pdfUrl: string | null;
  },
) {
  const name = await dealershipName(deps.db, opts.dealershipId);
  return sendOnce(deps, {
    key: `receipt:${opts.invoiceId}`,
    dealershipId: opts.dealershipId,
    kind: "receipt",
    subject: `Receipt ${opts.number} for ${name}: ${formatMoney(opts.amountMinor, opts.currency)} paid`,
    body: [
      `Thank you. We received ${formatMoney(opts.amountMinor, opts.currency)} for ${name}'s Treadcast report plan (invoice ${opts.number}).`,
      ...(opts.pdfUrl ? [`Invoice PDF: ${opts.pdfUrl}`] : []),
      `Plan, usage and invoices: ${billingUrl()}`,
    ],
  });
}

export async function sendPaymentFailedMail(
  deps: { db: Db; mailer: TMailSender },
  opts: {
    dealershipId: string;
    invoiceId: string;
    amountMinor: number;
    currency: string;
    graceEnds: Date;
  },
) {
  const name = await dealershipName(deps.db, opts.dealershipId);
  return sendOnce(deps, {
    key: `payment-failed:${opts.invoiceId}`,
    dealershipId: opts.dealershipId,
    kind: "payment_failed",
    subject: `Payment failed for ${name}'s Treadcast plan`,
    body: [
      `We could not take ${formatMoney(opts.amountMinor, opts.currency)} for ${name}'s Treadcast report plan.`,
      `Estimators can keep issuing quote reports until ${opts.graceEnds.toUTCString()}. After that, new reports stop until the payment goes through; issued reports stay readable.`,
      `Update the card here: ${billingUrl()}`,
    ],
  });
}

export async function sendTrialEndingMail(
  deps: { db: Db; mailer: TMailSender },
  opts: { dealershipId: string; trialEndsAt: Date },
) {
  const name = await dealershipName(deps.db, opts.dealershipId);
  return sendOnce(deps, {
    key: `trial-ending:${opts.dealershipId}:${opts.trialEndsAt.toISOString()}`,
    dealershipId: opts.dealershipId,
    kind: "trial_ending",
    subject: `${name}'s Treadcast trial ends in 3 days`,
    body: [
      `${name}'s free Treadcast trial ends on ${opts.trialEndsAt.toUTCString()}.`,
      "Choose a report plan before then so estimators can keep issuing quote reports. Reports already issued stay readable either way.",
      `Choose a plan: ${billingUrl()}`,
    ],
  });
}
