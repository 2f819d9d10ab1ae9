import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";
import { customers, estimates, machines } from "./workspace";

/**
 * Option studies: comparisons of machine variants and parameter sweeps, run from an estimate's
 * frozen inputs. Stored like estimates — inputs, versions and result frozen; a rerun adds a new
 * version to the same series.
 */
export const optionStudies = pgTable(
  "option_studies",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid().references(() => customers.id, { onDelete: "cascade" }),
    machineId: uuid()
      .notNull()
      .references(() => machines.id, { onDelete: "cascade" }),
    /** Estimate the study started from; its inputs are copied, so the study outlives it. */
    estimateId: uuid().references(() => estimates.id, { onDelete: "set null" }),
    /** "comparison" or "sweep". */
    kind: text().notNull(),
    /** Id of the series' first version; versions count up from 1. */
    seriesId: uuid().notNull(),
    version: integer().notNull().default(1),
    title: text().notNull(),
    machineName: text().notNull().default(""),
    engineVersion: text().notNull(),
    inputs: jsonb().notNull(),
    result: jsonb().notNull(),
    /** Lowest cost per hour among the options (comparison) or best point (sweep). */
    bestCostPerHour: doublePrecision(),
    currentCostPerHour: doublePrecision(),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("option_studies_dealership_kind_created").on(t.dealershipId, t.kind, t.createdAt, t.id),
    index("option_studies_machine").on(t.machineId),
    index("option_studies_customer").on(t.customerId),
    index("option_studies_series").on(t.seriesId, t.version),
  ],
);

export type TOptionStudy = typeof optionStudies.$inferSelect;
