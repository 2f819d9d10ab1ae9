import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycles, dutyCycleTurns } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TStraightTravel, TSurfaceKind } from "@/lib/scrub";
import { can } from "@/lib/authz/policy";
import { invalidReference } from "@/features/workspace/server/errors";
import type { TTurnWithOptionalSurface } from "@/features/workspace/lib/fill-surfaces";

/**
 * Reads a ready duty cycle the actor may see and its turn kinds, as engine turns whose surface
 * may still be unknown (filled from a site mix by the caller).
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
  const turns: TTurnWithOptionalSurface[] = rows.map((r) => ({
    perHour: r.perHour,
    turn: {
      ...(r.label ? { label: r.label } : {}),
      direction: r.direction === "right" ? "right" : "left",
      ...(r.radius !== null ? { radius: r.radius } : { steerInput: r.steerInput ?? 0 }),
      headingChange: r.headingChange,
      speed: r.speed,
      surface: r.surface,
      loadState: r.loadState === "unladen" ? "unladen" : "laden",
    },
  }));
  const straight = (cycle.straight as TStraightTravel | null) ?? null;
  return { cycle, turns, straight };
}

export function straightOrDefault(
  straight: TStraightTravel | null,
  mix: Partial<Record<TSurfaceKind, number>> | null,
): TStraightTravel {
  if (straight && Object.keys(straight.surfaceShares ?? {}).length > 0) return straight;
  return {
    distancePerHour: straight?.distancePerHour ?? 0,
    speed: straight?.speed ?? 2,
    surfaceShares: mix ?? { "firm-soil": 1 },
    frontDrive: straight?.frontDrive ?? "disengaged",
    ladenShare: straight?.ladenShare ?? 0,
  };
}
