import {
  boolean,
  customType,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";
import { customers, estimates, machines } from "./workspace";
import { invitations } from "./accounts";
import { optionStudies } from "./options";

/** Raw bytes (a re-encoded logo image). */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => "bytea",
});

/** What a dealership puts on its quote reports: name as printed, contact line, logo, currency. */
export const dealershipBrandings = pgTable("dealership_brandings", {
  dealershipId: uuid()
    .primaryKey()
    .references(() => dealerships.id, { onDelete: "cascade" }),
  displayName: text().notNull().default(""),
  contactLine: text().notNull().default(""),
  /** ISO 4217 code every amount on a report is shown in. */
  currency: text().notNull().default("EUR"),
  /** Re-encoded on upload (PNG), never the file as sent. */
  logo: bytea(),
  logoMime: text(),
  logoWidth: integer(),
  logoHeight: integer(),
  updatedById: text().references(() => users.id, { onDelete: "set null" }),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/**
 * A quote report for one customer: the editable draft (title, recommendations, note) and the
 * source it is built from. Issuing freezes everything into a new row of report_versions.
 */
export const reports = pgTable(
  "reports",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid()
      .notNull()
      .references(() => customers.id, { onDelete: "cascade" }),
    machineId: uuid().references(() => machines.id, { onDelete: "set null" }),
    /** "estimate" (one option) or "comparison" (several options). */
    sourceKind: text().notNull().default("estimate"),
    estimateId: uuid().references(() => estimates.id, { onDelete: "set null" }),
    /** The comparison a report was built from (options feature), when sourceKind is "comparison". */
    comparisonId: uuid().references(() => optionStudies.id, { onDelete: "set null" }),
    title: text().notNull(),
    recommendations: text().notNull().default(""),
    customerNote: text().notNull().default(""),
    /** Highest issued version; 0 while the report is a draft. */
    latestVersion: integer().notNull().default(0),
    customerName: text().notNull().default(""),
    machineName: text().notNull().default(""),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("reports_dealership_updated").on(t.dealershipId, t.updatedAt, t.id),
    index("reports_customer").on(t.customerId),
    index("reports_estimate").on(t.estimateId),
    index("reports_comparison").on(t.comparisonId),
  ],
);

/**
 * An issued version: content frozen at issue. A database trigger (custom migration) refuses any
 * UPDATE of these columns except supersededAt, so no code path can rewrite what a customer read.
 */
export const reportVersions = pgTable(
  "report_versions",
  {
    id: uuid().primaryKey().defaultRandom(),
    reportId: uuid()
      .notNull()
      .references(() => reports.id, { onDelete: "cascade" }),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid().notNull(),
    version: integer().notNull(),
    content: jsonb().notNull(),
    logo: bytea(),
    logoMime: text(),
    engineVersion: text().notNull(),
    issuedById: text(),
    issuedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    supersededAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    uniqueIndex("report_versions_report_version").on(t.reportId, t.version),
    index("report_versions_dealership_issued").on(t.dealershipId, t.issuedAt),
  ],
);

/** A report shared with its customer; notified by e-mail, opened times recorded. */
export const reportShares = pgTable(
  "report_shares",
  {
    id: uuid().primaryKey().defaultRandom(),
    reportId: uuid()
      .notNull()
      .references(() => reports.id, { onDelete: "cascade" }),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid().notNull(),
    /** Where the notice went. */
    email: text().notNull(),
    /** The customer account notified, or null when an invitation was sent instead. */
    userId: text().references(() => users.id, { onDelete: "set null" }),
    invitationId: uuid().references(() => invitations.id, { onDelete: "set null" }),
    sharedById: text().references(() => users.id, { onDelete: "set null" }),
    sharedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    withdrawnAt: timestamp({ withTimezone: true }),
    firstOpenedAt: timestamp({ withTimezone: true }),
    lastOpenedAt: timestamp({ withTimezone: true }),
    openCount: integer().notNull().default(0),
  },
  (t) => [
    index("report_shares_report").on(t.reportId),
    index("report_shares_customer").on(t.customerId),
  ],
);

/** The question thread on a report between the customer and the dealership. */
export const reportMessages = pgTable(
  "report_messages",
  {
    id: uuid().primaryKey().defaultRandom(),
    reportId: uuid()
      .notNull()
      .references(() => reports.id, { onDelete: "cascade" }),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    authorId: text().references(() => users.id, { onDelete: "set null" }),
    authorName: text().notNull(),
    fromCustomer: boolean().notNull(),
    body: text().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("report_messages_report").on(t.reportId, t.createdAt)],
);

export type TDealershipBranding = typeof dealershipBrandings.$inferSelect;
export type TReport = typeof reports.$inferSelect;
export type TReportVersion = typeof reportVersions.$inferSelect;
export type TReportShare = typeof reportShares.$inferSelect;
export type TReportMessage = typeof reportMessages.$inferSelect;
