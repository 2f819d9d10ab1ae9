import { sql } from "drizzle-orm";
import {
  check,
  index,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

/** Roles inside one dealership. A user may hold a different role in each dealership. */
export const membershipRole = pgEnum("membership_role", [
  "dealer_admin",
  "estimator",
  "billing_admin",
  "customer",
]);

export const unitSystem = pgEnum("unit_system", ["metric", "imperial"]);

export const dealerships = pgTable(
  "dealerships",
  {
    id: uuid().primaryKey().defaultRandom(),
    name: text().notNull(),
    slug: text().notNull().unique(),
    /** ISO 4217 code every amount of this dealership is priced and shown in. */
    currency: text().notNull().default("EUR"),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("dealerships_currency_iso4217", sql`${t.currency} ~ '^[A-Z]{3}$'`)],
);

/** Column names follow what @auth/drizzle-adapter expects of a users table. */
export const users = pgTable("users", {
  id: text()
    .primaryKey()
    .$defaultFn(() => crypto.randomUUID()),
  name: text(),
  email: text().notNull().unique(),
  emailVerified: timestamp({ mode: "date", withTimezone: true }),
  image: text(),
  passwordHash: text(),
  unitSystem: unitSystem().notNull().default("metric"),
  activeDealershipId: uuid().references(() => dealerships.id, { onDelete: "set null" }),
  /** Session tokens issued before this moment are refused (set by a password reset). */
  sessionsValidFrom: timestamp({ withTimezone: true }),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  "memberships",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    userId: text()
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: membershipRole().notNull(),
    /** Set only for role "customer": the one customer record this account may see. */
    customerId: uuid(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("memberships_dealership_user_role").on(t.dealershipId, t.userId, t.role),
    index("memberships_user").on(t.userId),
    index("memberships_customer")
      .on(t.customerId)
      .where(sql`${t.customerId} is not null`),
    // A customer account without its customer record would see nothing or, worse, everything.
    check(
      "memberships_customer_has_record",
      sql`(${t.role} = 'customer') = (${t.customerId} is not null)`,
    ),
  ],
);

export type TDealership = typeof dealerships.$inferSelect;
export type TUser = typeof users.$inferSelect;
export type TMembership = typeof memberships.$inferSelect;
export type TMembershipRole = (typeof membershipRole.enumValues)[number];
