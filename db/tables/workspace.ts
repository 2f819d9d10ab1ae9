import {
  index,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
  integer,
  doublePrecision,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";

/** A dealership's customer: farm, contractor, council, estate... */
export const customers = pgTable(
  "customers",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    name: text().notNull(),
    kind: text().notNull().default("farm"),
    contactName: text(),
    contactEmail: text(),
    contactPhone: text(),
    notes: text().notNull().default(""),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("customers_dealership_name").on(t.dealershipId, t.name)],
);

/** A place a customer works, with its surface mix as shares that add up to 1. */
export const sites = pgTable(
  "sites",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid()
      .notNull()
      .references(() => customers.id, { onDelete: "cascade" }),
    name: text().notNull(),
    surfaceMix: jsonb().$type<Record<string, number>>().notNull(),
    notes: text().notNull().default(""),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sites_customer").on(t.customerId)],
);

/**
 * A machine profile. `spec` holds the engine's machine input (validated by the engine's
 * zod schema before it is stored). customerId is null for a dealership template.
 */
export const machines = pgTable(
  "machines",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid().references(() => customers.id, { onDelete: "cascade" }),
    name: text().notNull(),
    kind: text().notNull(),
    spec: jsonb().notNull(),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("machines_dealership_name").on(t.dealershipId, t.name),
    index("machines_customer").on(t.customerId),
  ],
);

/** A stored run of the engine: inputs frozen so the result can be reproduced. */
export const estimates = pgTable(
  "estimates",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid().references(() => customers.id, { onDelete: "cascade" }),
    machineId: uuid()
      .notNull()
      .references(() => machines.id, { onDelete: "cascade" }),
    dutyCycleId: uuid().notNull(),
    title: text().notNull(),
    machineVersion: integer().notNull(),
    engineVersion: text().notNull(),
    inputs: jsonb().notNull(),
    result: jsonb().notNull(),
    costPerHour: doublePrecision(),
    hoursToFirstReplacement: doublePrecision(),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("estimates_dealership_created").on(t.dealershipId, t.createdAt),
    index("estimates_machine").on(t.machineId),
    index("estimates_duty_cycle").on(t.dutyCycleId),
  ],
);

export type TCustomer = typeof customers.$inferSelect;
export type TSite = typeof sites.$inferSelect;
export type TMachine = typeof machines.$inferSelect;
export type TEstimate = typeof estimates.$inferSelect;
