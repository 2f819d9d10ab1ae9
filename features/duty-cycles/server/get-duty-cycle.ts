import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { customers, dutyCycleTurns, dutyCycleUploads } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TSurfaceKind } from "@/lib/scrub/schemas";
import type { TDutyCycleSummary } from "@/lib/duty-cycles/summarise";
import type { TStoredTurn, TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import type { TDutyCycleDetail } from "@/features/duty-cycles/schemas/duty-cycle";
import { loadDutyCycleFor } from "@/features/duty-cycles/server/authorize";
import { toDutyCycleRow } from "@/features/duty-cycles/server/duty-cycle-dto";

const TURNS_SHOWN = 200;

export async function getDutyCycle({
  db,
  actor,
  id,
}: {
  db: DbOrTx;
  actor: TActor;
  id: string;
}): Promise<TDutyCycleDetail> {
  const cycle = await loadDutyCycleFor(db, actor, id, "duty-cycle:read");
  const [[customer], upload, turns, [count]] = await Promise.all([
    db.select({ name: customers.name }).from(customers).where(eq(customers.id, cycle.customerId)),
    cycle.uploadId
      ? db.select().from(dutyCycleUploads).where(eq(dutyCycleUploads.id, cycle.uploadId))
      : Promise.resolve([]),
    db
      .select()
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, id))
      .orderBy(asc(dutyCycleTurns.seq))
      .limit(TURNS_SHOWN),
    db
      .select({ n: sql<number>`count(*)::int` })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, id)),
  ]);
  const summary = cycle.summary as (TDutyCycleSummary & { notes?: string[] }) | null;
  const file = upload[0];
  return {
    ...toDutyCycleRow(cycle, customer?.name ?? ""),
    failureReason: cycle.failureReason,
    summary,
    straight: cycle.straight as TStraight | null,
    rowsUsed: cycle.rowsUsed,
    rowsSkipped: cycle.rowsSkipped,
    attempts: cycle.attempts,
    interruptions: cycle.interruptions,
    version: cycle.version,
    builderInput: cycle.builderInput,
    notes: summary?.notes ?? [],
    upload: file
      ? {
          originalName: file.originalName,
          sizeBytes: file.sizeBytes,
          sha256: file.sha256,
          uploadedAt: file.uploadedAt.toISOString(),
        }
      : null,
    turns: turns.map((t): TStoredTurn => ({
      seq: t.seq,
      label: t.label,
      direction: t.direction === "right" ? "right" : "left",
      radius: t.radius,
      steerInput: t.steerInput,
      headingChange: t.headingChange,
      speed: t.speed,
      perHour: t.perHour,
      surface: t.surface as TSurfaceKind,
      loadState: t.loadState === "unladen" ? "unladen" : "laden",
      reverse: t.reverse === 1,
      distance: t.distance,
      duration: t.duration,
      startTime: t.startTime,
    })),
    turnCount: count?.n ?? 0,
  };
}
