// The bulk turn insert (one unnest statement) stores exactly what the per-row insert stored:
// every column, nulls included, in order, against the real PostgreSQL.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { customers, dutyCycleTurns, dutyCycles } from "@/db/schema";
import { createTestDealership } from "@/tests/support/session";
import { insertTurns } from "@/features/duty-cycles/server/insert-turns";
import { toTurnRow } from "@/features/duty-cycles/server/turn-rows";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";

const db = getDb();
let dutyCycleId: string;

beforeAll(async () => {
  const dealership = await createTestDealership(db, "Bulk Insert Dealership");
  const [customer] = await db
    .insert(customers)
    .values({ dealershipId: dealership.id, name: "Ashcombe Lane Farm" })
    .returning();
  const [cycle] = await db
    .insert(dutyCycles)
    .values({
      dealershipId: dealership.id,
      customerId: customer!.id,
      name: "Bulk insert check",
      source: "telematics",
    })
    .returning();
  dutyCycleId = cycle!.id;
});

afterAll(async () => {
  await db.delete(dutyCycles).where(eq(dutyCycles.id, dutyCycleId));
});

/** Invented turns covering every column shape: nulls, text, awkward doubles, both booleans. */
function sampleTurns(n: number): TStoredTurn[] {
  return Array.from({ length: n }, (_v, i) => ({
    seq: i + 1,
    label: i % 3 === 0 ? "pivot" : i % 3 === 1 ? null : `it's "turn" ${i}, with a comma`,
    direction: i % 2 ? "left" : "right",
    radius: i % 10 === 0 ? null : i % 5 === 0 ? 0 : 6.123456789012345 + i / 7,
    steerInput: i % 4 === 0 ? null : -0.1 * i,
    headingChange: 180 - i / 3,
    speed: 1e-7 + i,
    perHour: 1 / 27.777777777777777,
    surface: i % 2 ? "loose-soil" : "concrete-asphalt",
    loadState: i % 2 ? "laden" : "unladen",
    reverse: i % 2 === 0,
    distance: i % 7 === 0 ? null : Math.PI * i,
    duration: 12.5,
    startTime: 1e5 + i / 10,
  }));
}

describe("insertTurns", () => {
  it("stores every column of every turn exactly, in one statement", async () => {
    const turns = sampleTurns(2500);
    await db.transaction((tx) => insertTurns(tx, dutyCycleId, turns));
    const stored = await db
      .select()
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId))
      .orderBy(asc(dutyCycleTurns.seq));
    expect(stored).toHaveLength(turns.length);
    expect(stored.map(({ id: _id, ...row }) => row)).toEqual(
      turns.map((t) => toTurnRow(dutyCycleId, t)),
    );
  });

  it("does nothing for no turns", async () => {
    await db.delete(dutyCycleTurns).where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId));
    await insertTurns(db, dutyCycleId, []);
    const stored = await db
      .select()
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId));
    expect(stored).toHaveLength(0);
  });
});
