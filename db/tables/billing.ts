import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships } from "./tenancy";

/** trial: the free start; pack: one-off reports; monthly/annual: subscriptions. */
export const billingPlanKind = pgEnum("billing_plan_kind", ["trial", "pack", "monthly", "annual"]);

/** Our copy of the payment provider's subscription state, plus the trial and pack credit we run. */
export const billingStatus = pgEnum("billing_status", [
  "none",
  "trialing",
  "active",
  "past_due",
  "cancelled",
  "incomplete",
]);

/** Plans are data: prices, currencies and quotas are seeded, never written in code. */
export const billingPlans = pgTable("billing_plans", {
  /** Stable key, also the provider's price lookup key. */
  key: text().primaryKey(),
  name: text().notNull(),
  kind: billingPlanKind().notNull(),
  description: text().notNull().default(""),
  /** ISO 4217, lower case as the provider writes it. */
  currency: text().notNull(),
  /** Price in the currency's minor unit (pence, cents). Zero for the trial. */
  priceMinor: integer().notNull(),
  /** Reports included per calendar month (monthly, annual), per pack, or for the whole trial. */
  includedReports: integer().notNull(),
  /** Price per report beyond the included ones; null means the quota is a hard limit. */
  overageMinor: integer(),
  /** Length of the trial. */
  trialDays: integer(),
  /** The provider's price id, filled the first time the plan is sold. */
  providerPriceId: text(),
  active: boolean().notNull().default(true),
  sortOrder: integer().notNull().default(0),
});

/** One billing account per dealership. */
export const billingAccounts = pgTable(
  "billing_accounts",
  {
    dealershipId: uuid()
      .primaryKey()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    providerCustomerId: text().unique(),
    billingEmail: text(),
    status: billingStatus().notNull().default("none"),
    /** The subscription's or trial's plan; null with no plan. */
    planKey: text().references(() => billingPlans.key),
    providerSubscriptionId: text().unique(),
    currentPeriodStart: timestamp({ withTimezone: true }),
    currentPeriodEnd: timestamp({ withTimezone: true }),
    cancelAtPeriodEnd: boolean().notNull().default(false),
    trialStartedAt: timestamp({ withTimezone: true }),
    trialEndsAt: timestamp({ withTimezone: true }),
    trialEndingMailSentAt: timestamp({ withTimezone: true }),
    /** Set when a payment first fails; new reports stop after the grace period. */
    pastDueSince: timestamp({ withTimezone: true }),
    /** Reports bought in packs and not yet used; spent after a subscription's included reports. */
    packCredits: integer().notNull().default(0),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("billing_accounts_pack_credits", sql`${t.packCredits} >= 0`)],
);

/** One row per issued report that counted against an allowance; a report counts once. */
export const reportAllowanceUses = pgTable(
  "report_allowance_uses",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    reportId: uuid().notNull(),
    planKey: text(),
    /** "included", "pack" or "overage". */
    source: text().notNull(),
    countedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    /** Set once the overage charge reached the provider. */
    overageBilledAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("report_allowance_uses_report").on(t.reportId),
    index("report_allowance_uses_counted").on(t.dealershipId, t.countedAt),
  ],
);

/** Every provider event accepted by the webhook; the primary key makes delivery idempotent. */
export const billingWebhookEvents = pgTable(
  "billing_webhook_events",
  {
    eventId: text().primaryKey(),
    type: text().notNull(),
    objectId: text(),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    processedAt: timestamp({ withTimezone: true }),
    error: text(),
  },
  (t) => [index("billing_webhook_events_unprocessed").on(t.receivedAt)],
);

/** Pack purchases credited, keyed by the checkout session so a credit lands once. */
export const billingPackGrants = pgTable("billing_pack_grants", {
  checkoutSessionId: text().primaryKey(),
  dealershipId: uuid()
    .notNull()
    .references(() => dealerships.id, { onDelete: "cascade" }),
  planKey: text()
    .notNull()
    .references(() => billingPlans.key),
  reports: integer().notNull(),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/** Billing e-mails sent, keyed by what they are about, so a retried job does not send twice. */
export const billingMailLog = pgTable("billing_mail_log", {
  key: text().primaryKey(),
  dealershipId: uuid()
    .notNull()
    .references(() => dealerships.id, { onDelete: "cascade" }),
  kind: text().notNull(),
  detail: jsonb().$type<Record<string, unknown>>().notNull().default({}),
  sentAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export type TBillingPlan = typeof billingPlans.$inferSelect;
export type TBillingAccount = typeof billingAccounts.$inferSelect;
export type TBillingStatus = (typeof billingStatus.enumValues)[number];
export type TBillingPlanKind = (typeof billingPlanKind.enumValues)[number];
