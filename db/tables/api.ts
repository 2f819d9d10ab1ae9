import { sql } from "drizzle-orm";
import {
  check,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";

/**
 * A dealership's credential for its own systems. Only the SHA-256 of the secret is kept: the
 * secret is shown once, when the token is made. It acts for its creator, never beyond its scopes.
 */
export const apiTokens = pgTable(
  "api_tokens",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    createdById: text()
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: text().notNull(),
    /** "read", "read_write", "reports": what the token may do (see features/api/lib/scopes.ts). */
    scopes: text().array().notNull(),
    /** The first characters of the secret, shown in lists so a token can be recognised. */
    prefix: text().notNull(),
    secretHash: text().notNull().unique(),
    requestsPerMinute: integer().notNull().default(600),
    expiresAt: timestamp({ withTimezone: true }),
    lastUsedAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("api_tokens_dealership_created").on(t.dealershipId, t.createdAt),
    check("api_tokens_scopes_nonempty", sql`cardinality(${t.scopes}) > 0`),
    check("api_tokens_rate_positive", sql`${t.requestsPerMinute} > 0`),
  ],
);

/**
 * The first answer to a creating POST sent with an Idempotency-Key, so a retry gets the same
 * answer instead of a second record. Keys are per caller (a token, or a signed-in user).
 */
export const idempotencyKeys = pgTable(
  "idempotency_keys",
  {
    /** "token:<id>" or "user:<id>". */
    principal: text().notNull(),
    key: text().notNull(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    method: text().notNull(),
    path: text().notNull(),
    /** SHA-256 of the request body: the same key with another body is refused. */
    requestHash: text().notNull(),
    /** Null while the first request is still running. */
    status: integer(),
    responseBody: jsonb(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.principal, t.key] }),
    index("idempotency_keys_created").on(t.createdAt),
  ],
);

export type TApiToken = typeof apiTokens.$inferSelect;
