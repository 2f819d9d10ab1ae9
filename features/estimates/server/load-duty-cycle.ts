import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycles, dutyCycleTurns } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import { invalidReference } from "@/features/platform";
import { toStoredTurn } from "@/features/estimates/lib/estimate-record";

/**
 * Reads a ready duty cycle the actor may see with its stored turns (whose surface may still be
 * unknown and is filled from a site mix by the caller).
 */
export async function loadDutyCycleForEstimate(db: DbOrTx, actor: TActor, id: string) {
  const [cycle] = await db
    .select()
    .from(dutyCycles)
    .where(and(eq(dutyCycles.id, id), eq(dutyCycles.dealershipId, actor.dealershipId)));
  if (!cycle || !can(actor, "duty-cycle:read", cycle))
    throw invalidReference("dutyCycleId", "No duty cycle with that id in your dealership.");
  if (cycle.status !== "ready")
    throw invalidReference(
      "dutyCycleId",
      `This duty cycle is ${cycle.status}${cycle.failureReason ? ` (${cycle.failureReason})` : ""}; only a ready duty cycle can be estimated.`,
    );
  const rows = await db
    .select()
    .from(dutyCycleTurns)
    .where(eq(dutyCycleTurns.dutyCycleId, id))
    .orderBy(asc(dutyCycleTurns.seq));
  const turns = rows.map(toStoredTurn);
  return { cycle, turns, straight: (cycle.straight as TStraight | null) ?? null };
}
