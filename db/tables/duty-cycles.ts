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
  uniqueIndex,
  boolean,
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

/** An uploaded file, kept as received: where it is stored, its checksum and who sent it. */
export const dutyCycleUploads = pgTable(
  "duty_cycle_uploads",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    /** File name as the browser sent it (display only; never used as a path). */
    originalName: text().notNull(),
    /** Path relative to UPLOAD_DIR. */
    storagePath: text().notNull(),
    sha256: text().notNull(),
    sizeBytes: bigint({ mode: "number" }).notNull(),
    contentType: text().notNull().default("text/csv"),
    uploadedById: text().references(() => users.id, { onDelete: "set null" }),
    uploadedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("duty_cycle_uploads_dealership").on(t.dealershipId, t.uploadedAt)],
);

/** A dealership's saved column mapping, reused on the next file from the same source. */
export const mappingTemplates = pgTable(
  "mapping_templates",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    name: text().notNull(),
    /** "telematics" or "schedule". */
    kind: text().notNull(),
    /** ZColumnMapping (features/duty-cycles/schemas). */
    mapping: jsonb().notNull(),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("mapping_templates_dealership_name").on(t.dealershipId, t.name)],
);

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
    /** Straight travel per operating hour (TStraightTravel of the engine). */
    straight: jsonb(),
    /** Builder inputs, kept so the builder can reopen them (source "builder" only). */
    builderInput: jsonb(),
    uploadId: uuid().references(() => dutyCycleUploads.id, { onDelete: "set null" }),
    /** The column mapping used for the import (a copy: templates may change later). */
    mapping: jsonb(),
    rowsUsed: integer().notNull().default(0),
    rowsSkipped: integer().notNull().default(0),
    /** Background job state: the queue's job id and how many times processing started. */
    jobId: text(),
    attempts: integer().notNull().default(0),
    processingStartedAt: timestamp({ withTimezone: true }),
    /** Renewed every few seconds by the worker running the import; a stale one means it died. */
    heartbeatAt: timestamp({ withTimezone: true }),
    /** Times an import was taken back from a worker that stopped mid-way and queued again. */
    interruptions: integer().notNull().default(0),
    processedAt: timestamp({ withTimezone: true }),
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
    label: text(),
    direction: text().notNull().default("left"),
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
    /** Telematics only: seconds from the start of the log. */
    startTime: doublePrecision(),
  },
  (t) => [index("duty_cycle_turns_cycle_seq").on(t.dutyCycleId, t.seq)],
);

/** A row the import skipped, with where and why, for the bad-rows download. */
export const dutyCycleImportErrors = pgTable(
  "duty_cycle_import_errors",
  {
    id: bigint({ mode: "number" }).primaryKey().generatedAlwaysAsIdentity(),
    dutyCycleId: uuid()
      .notNull()
      .references(() => dutyCycles.id, { onDelete: "cascade" }),
    line: integer().notNull(),
    column: text().notNull(),
    reason: text().notNull(),
    value: text(),
    /** true on the one row noting that further errors were counted but not stored. */
    truncated: boolean().notNull().default(false),
  },
  (t) => [index("duty_cycle_import_errors_cycle_line").on(t.dutyCycleId, t.line)],
);

export type TDutyCycle = typeof dutyCycles.$inferSelect;
export type TDutyCycleTurn = typeof dutyCycleTurns.$inferSelect;
export type TDutyCycleUpload = typeof dutyCycleUploads.$inferSelect;
export type TMappingTemplate = typeof mappingTemplates.$inferSelect;
export type TDutyCycleImportError = typeof dutyCycleImportErrors.$inferSelect;
