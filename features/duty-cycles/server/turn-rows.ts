// Shared by the app, the worker and the seed, so no "server-only" marker.
import type { TStoredTurn } from "@/lib/duty-cycles/stored-duty-cycle";

/** A stored turn as a row of duty_cycle_turns. */
export function toTurnRow(dutyCycleId: string, t: TStoredTurn) {
  return {
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
  };
}
