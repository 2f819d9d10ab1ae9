import {
  index,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
  integer,
  doublePrecision,
  pgEnum,
  bigint,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";
import { customers, machines } from "./workspace";

export const dutyCycleSource = pgEnum("duty_cycle_source", ["telematics", "schedule", "builder"]);
export const dutyCycleStatus = pgEnum("duty_cycle_status", [
  "pending",
  "processing",
  "ready",
  "failed",
]);

/** A customer's duty cycle: turns per operating hour, from an upload or the builder. */
export const dutyCycles = pgTable(
  "duty_cycles",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    customerId: uuid()
      .notNull()
      .references(() => customers.id, { onDelete: "cascade" }),
    machineId: uuid().references(() => machines.id, { onDelete: "set null" }),
    name: text().notNull(),
    source: dutyCycleSource().notNull(),
    status: dutyCycleStatus().notNull().default("pending"),
    failureReason: text(),
    progress: doublePrecision().notNull().default(0),
    operatingHours: doublePrecision(),
    /** Summary for lists and charts (hours, distance, bands); the turns live in duty_cycle_turns. */
    summary: jsonb(),
    version: integer().notNull().default(1),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("duty_cycles_dealership_created").on(t.dealershipId, t.createdAt),
    index("duty_cycles_customer").on(t.customerId),
  ],
);

/** One kind of turn in a duty cycle, with how often it happens per operating hour. */
export const dutyCycleTurns = pgTable(
  "duty_cycle_turns",
  {
    id: bigint({ mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    dutyCycleId: uuid()
      .notNull()
      .references(() => dutyCycles.id, { onDelete: "cascade" }),
    seq: integer().notNull(),
    radius: doublePrecision(),
    steerInput: doublePrecision(),
    headingChange: doublePrecision().notNull(),
    speed: doublePrecision().notNull(),
    perHour: doublePrecision().notNull(),
    surface: text().notNull(),
    loadState: text().notNull().default("laden"),
    reverse: integer().notNull().default(0),
    distance: doublePrecision(),
    duration: doublePrecision(),
  },
  (t) => [index("duty_cycle_turns_cycle_seq").on(t.dutyCycleId, t.seq)],
);

export type TDutyCycle = typeof dutyCycles.$inferSelect;
export type TDutyCycleTurn = typeof dutyCycleTurns.$inferSelect;
