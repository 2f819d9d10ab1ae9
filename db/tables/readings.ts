import {
  customType,
  date,
  doublePrecision,
  index,
  integer,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";
import { dealerships, users } from "./tenancy";
import { machines } from "./workspace";

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

/**
 * One tread measurement of one tyre position, or (kind "fitted") a tyre change: the new tyre's
 * fitment and depth, from which the position's history starts again. Depths in mm.
 */
export const treadReadings = pgTable(
  "tread_readings",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    machineId: uuid()
      .notNull()
      .references(() => machines.id, { onDelete: "cascade" }),
    position: text().notNull(),
    kind: text().notNull().default("reading"),
    measuredOn: date({ mode: "string" }).notNull(),
    hourMeter: doublePrecision().notNull(),
    depthCentre: doublePrecision().notNull(),
    depthInner: doublePrecision(),
    depthOuter: doublePrecision(),
    /** The fitted tyre's size (tyre changes; readings may leave it empty). */
    designation: text(),
    measuredBy: text().notNull(),
    note: text().notNull().default(""),
    createdById: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("tread_readings_machine").on(t.machineId, t.position, t.hourMeter),
    index("tread_readings_dealership").on(t.dealershipId, t.measuredOn),
  ],
);

/** A photo taken with a reading, stored in the database beside it (size-limited on upload). */
export const treadReadingPhotos = pgTable(
  "tread_reading_photos",
  {
    id: uuid().primaryKey().defaultRandom(),
    dealershipId: uuid()
      .notNull()
      .references(() => dealerships.id, { onDelete: "cascade" }),
    readingId: uuid()
      .notNull()
      .references(() => treadReadings.id, { onDelete: "cascade" }),
    contentType: text().notNull(),
    byteSize: integer().notNull(),
    bytes: bytea().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("tread_reading_photos_reading").on(t.readingId)],
);

export type TTreadReading = typeof treadReadings.$inferSelect;
export type TTreadReadingPhoto = typeof treadReadingPhotos.$inferSelect;
