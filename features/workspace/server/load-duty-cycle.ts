import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { dutyCycles, dutyCycleTurns } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import type { TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import { invalidReference } from "@/features/workspace/server/errors";
import type { TSurfaceMixShares } from "@/features/workspace/lib/fill-surfaces";

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
  const turns = rows.map((r) => ({
    seq: r.seq,
    label: r.label,
    direction: r.direction === "right" ? ("right" as const) : ("left" as const),
    radius: r.radius,
    steerInput: r.steerInput,
    headingChange: r.headingChange,
    speed: r.speed,
    perHour: r.perHour,
    surface: r.surface,
    loadState: r.loadState === "unladen" ? ("unladen" as const) : ("laden" as const),
    reverse: r.reverse !== 0,
    distance: r.distance,
    duration: r.duration,
    startTime: r.startTime,
  }));
  return { cycle, turns, straight: (cycle.straight as TStraight | null) ?? null };
}

/** Straight travel as stored, with the site's mix where the cycle recorded no surfaces. */
export function straightWithMix(
  straight: TStraight | null,
  mix: TSurfaceMixShares | null,
): TStraight {
  const hasShares =
    straight && Object.values(straight.surfaceShares ?? {}).some((v) => (v ?? 0) > 0);
  return {
    distancePerHour: straight?.distancePerHour ?? 0,
    speed: straight?.speed ?? 2,
    surfaceShares: hasShares ? straight.surfaceShares : (mix ?? { "firm-soil": 1 }),
    ladenShare: straight?.ladenShare ?? 0,
  };
}
