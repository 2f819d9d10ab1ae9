import {
  index,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
  integer,
  doublePrecision,
  type AnyPgColumn,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";

/** A person to talk to at a customer (buyer, workshop foreman, operator). */
export type TCustomerContact = {
  name: string;
  role?: string;
  email?: string;
  phone?: string;
};

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
    /** Further contacts beyond the main one. */
    contacts: jsonb().$type<TCustomerContact[]>().notNull().default([]),
    notes: text().notNull().default(""),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("customers_dealership_name").on(t.dealershipId, t.name, t.id),
    index("customers_dealership_updated").on(t.dealershipId, t.updatedAt, t.id),
  ],
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
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("sites_customer").on(t.customerId),
    index("sites_dealership_name").on(t.dealershipId, t.name, t.id),
  ],
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
    /** Steering layout of the default mode, copied out of spec for filtering. */
    layout: text().notNull().default("ideal"),
    spec: jsonb().notNull(),
    /** The template this machine was copied from, if any. */
    templateId: uuid().references((): AnyPgColumn => machines.id, { onDelete: "set null" }),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("machines_dealership_name").on(t.dealershipId, t.name, t.id),
    index("machines_dealership_updated").on(t.dealershipId, t.updatedAt, t.id),
    index("machines_customer").on(t.customerId),
    index("machines_dealership_layout").on(t.dealershipId, t.layout, t.name),
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
    /** The duty cycle used; its turns are frozen in `inputs`, so the estimate outlives it. */
    dutyCycleId: uuid(),
    dutyCycleVersion: integer().notNull().default(1),
    /** Site whose surface mix filled in turns without a surface, if one was chosen. */
    siteId: uuid().references(() => sites.id, { onDelete: "set null" }),
    title: text().notNull(),
    machineName: text().notNull().default(""),
    dutyCycleName: text().notNull().default(""),
    machineVersion: integer().notNull(),
    engineVersion: text().notNull(),
    inputs: jsonb().notNull(),
    result: jsonb().notNull(),
    costPerHour: doublePrecision(),
    hoursToFirstReplacement: doublePrecision(),
    firstToWear: text(),
    warningCount: integer().notNull().default(0),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("estimates_dealership_created").on(t.dealershipId, t.createdAt, t.id),
    index("estimates_customer_created").on(t.customerId, t.createdAt),
    // Sortable list columns: a page deep into a sorted list reads the index, not every row.
    index("estimates_dealership_cost").on(t.dealershipId, t.costPerHour, t.id),
    index("estimates_dealership_hours").on(t.dealershipId, t.hoursToFirstReplacement, t.id),
    index("estimates_machine").on(t.machineId),
    index("estimates_duty_cycle").on(t.dutyCycleId),
  ],
);

export type TCustomer = typeof customers.$inferSelect;
export type TSite = typeof sites.$inferSelect;
export type TMachine = typeof machines.$inferSelect;
export type TEstimate = typeof estimates.$inferSelect;
