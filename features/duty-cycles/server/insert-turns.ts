// Used by the worker process as well as the app, so no "server-only" marker.
import { sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";
import { toTurnRow } from "@/features/duty-cycles/server/turn-rows";

type TTurnRow = ReturnType<typeof toTurnRow>;

/**
 * Inserts a cycle's turns in one statement (inside the caller's transaction): one array
 * parameter per column, spread into rows by unnest. A multi-row VALUES list of thousands of
 * turns costs far more to build and bind (15 parameters a turn) than 15 arrays.
 */
export async function insertTurns(
  tx: DbOrTx,
  dutyCycleId: string,
  turns: readonly TStoredTurn[],
): Promise<void> {
  if (turns.length === 0) return;
  const rows = turns.map((t) => toTurnRow(dutyCycleId, t));
  const column = <K extends keyof TTurnRow>(key: K) => sql.param(rows.map((r) => r[key]));
  await tx.execute(sql`
    insert into duty_cycle_turns (
      duty_cycle_id, seq, label, direction, radius, steer_input, heading_change, speed, per_hour,
      surface, load_state, reverse, distance, duration, start_time
    )
    select ${dutyCycleId}::uuid, * from unnest(
      ${column("seq")}::integer[], ${column("label")}::text[], ${column("direction")}::text[],
      ${column("radius")}::double precision[], ${column("steerInput")}::double precision[],
      ${column("headingChange")}::double precision[], ${column("speed")}::double precision[],
      ${column("perHour")}::double precision[], ${column("surface")}::text[],
      ${column("loadState")}::text[], ${column("reverse")}::integer[],
      ${column("distance")}::double precision[], ${column("duration")}::double precision[],
      ${column("startTime")}::double precision[]
    )`);
}
