import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycleTurns } from "@/db/schema";
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";
import { toTurnRow } from "@/features/duty-cycles/server/turn-rows";

/** Replaces a builder cycle's turns (inside the caller's transaction). */
export async function storeBuiltTurns(
  tx: DbOrTx,
  dutyCycleId: string,
  turns: readonly TStoredTurn[],
) {
  await tx.delete(dutyCycleTurns).where(eq(dutyCycleTurns.dutyCycleId, dutyCycleId));
  if (turns.length === 0) return;
  await tx.insert(dutyCycleTurns).values(turns.map((t) => toTurnRow(dutyCycleId, t)));
}
