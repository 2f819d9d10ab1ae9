import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycleTurns } from "@/db/schema";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";

/** Replaces a builder cycle's turns (inside the caller's transaction). */
export async function storeBuiltTurns(
  tx: DbOrTx,
  dutyCycleId: string,
  turns: readonly TStoredTurn[],
) {
  await tx.delete(dutyCycleTurns).where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId));
  if (turns.length === 0) return;
  await tx.insert(dutyCycleTurns).values(
    turns.map((t) => ({
      dutyCycleId,
      seq: t.seq,
      label: t.label,
      direction: t.direction,
      radius: t.radius,
      steerInput: t.steerInput,
      headingChange: t.headingChange,
      speed: t.speed,
      perHour: t.perHour,
      surface: t.surface,
      loadState: t.loadState,
      reverse: t.reverse ? 1 : 0,
      distance: t.distance,
      duration: t.duration,
      startTime: t.startTime,
    })),
  );
}
