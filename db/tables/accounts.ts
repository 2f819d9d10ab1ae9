import {
  index,
  inet,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships, membershipRole, users } from "./tenancy";
import { customers } from "./workspace";

/** OAuth-style linked accounts, as @auth/drizzle-adapter expects (unused by e-mail sign-in). */
export const accounts = pgTable(
  "accounts",
  {
    userId: text()
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    type: text().notNull(),
    provider: text().notNull(),
    providerAccountId: text().notNull(),
    refresh_token: text(),
    access_token: text(),
    expires_at: integer(),
    token_type: text(),
    scope: text(),
    id_token: text(),
    session_state: text(),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })],
);

/** Database sessions, required by the adapter; Treadcast signs in with JWT sessions instead. */
export const sessions = pgTable("sessions", {
  sessionToken: text().primaryKey(),
  userId: text()
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expires: timestamp({ mode: "date", withTimezone: true }).notNull(),
});

/** Magic-link tokens (hashed by Auth.js before they are stored). */
export const verificationTokens = pgTable(
  "verification_tokens",
  {
    identifier: text().notNull(),
    token: text().notNull(),
    expires: timestamp({ mode: "date", withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);

/** An e-mailed invitation to join a dealership with one role; single use, expires. */
export const invitations = pgTable(
  "invitations",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    email: text().notNull(),
    role: membershipRole().notNull(),
    /** For role "customer": the customer record the new account will see. */
    customerId: uuid().references(() => customers.id, { onDelete: "cascade" }),
    /** SHA-256 of the token in the link; the token itself is only in the e-mail. */
    tokenHash: text().notNull().unique(),
    invitedById: text().references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    acceptedAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("invitations_dealership_created").on(t.dealershipId, t.createdAt)],
);

/** A password-reset link; single use, expires. */
export const passwordResetTokens = pgTable("password_reset_tokens", {
  tokenHash: text().primaryKey(),
  userId: text()
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expiresAt: timestamp({ withTimezone: true }).notNull(),
  usedAt: timestamp({ withTimezone: true }),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/**
 * Security events. dealershipId is null for events no dealership may see (e.g. a failed
 * sign-in for an address that has no account).
 */
export const auditEvents = pgTable(
  "audit_events",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid().references(() => dealerships.id, { onDelete: "cascade" }),
    actorUserId: text().references(() => users.id, { onDelete: "set null" }),
    /** e.g. "sign_in", "sign_in_failed", "invitation_sent", "role_changed", "member_removed". */
    kind: text().notNull(),
    /** The address or person the event is about. */
    subject: text(),
    detail: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    ip: inet(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_events_dealership_created").on(t.dealershipId, t.createdAt)],
);

/** Fixed-window counters for abuse limits; in PostgreSQL so they hold across app instances. */
export const rateLimitCounters = pgTable(
  "rate_limit_counters",
  {
    key: text().notNull(),
    windowStart: timestamp({ withTimezone: true }).notNull(),
    hits: integer().notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.key, t.windowStart] }),
    index("rate_limit_counters_window").on(t.windowStart),
  ],
);

/** Messages caught by the local SMTP fake, read by tests and the development mailbox page. */
export const capturedMails = pgTable(
  "captured_mails",
  {
    id: uuid().primaryKey().defaultRandom(),
    from: text().notNull().default(""),
    to: text().array().notNull(),
    subject: text().notNull().default(""),
    text: text().notNull().default(""),
    html: text(),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("captured_mails_received").on(t.receivedAt)],
);

export type TInvitation = typeof invitations.$inferSelect;
export type TAuditEvent = typeof auditEvents.$inferSelect;
export type TCapturedMail = typeof capturedMails.$inferSelect;
