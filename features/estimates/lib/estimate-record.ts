import {
  ENGINE_VERSION,
  estimate,
  type TEstimateResult,
  type TMachineInput,
  type TSurfaceKind,
} from "@/lib/scrub";
import type { TStraight } from "@/lib/duty-cycles/stored-duty-cycle";
import { toEngineDutyCycle } from "@/lib/duty-cycles/to-engine-duty-cycle";
import { fillSurfaces } from "@/features/customers";
import type { TDutyCycleTurn } from "@/db/schema";

/** Above this many turn kinds the per-wheel detail of each turn is not kept (size of the row). */
const TURN_DETAIL_LIMIT = 2000;

/** A stored turn row as the duty-cycle converter reads it (surface may still be unknown). */
export function toStoredTurn(r: TDutyCycleTurn) {
  return {
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
  };
}

/** Straight travel as stored, with the site's mix where the cycle recorded no surfaces. */
export function straightWithMix(
  straight: TStraight | null,
  mix: Partial<Record<TSurfaceKind, number>> | null,
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

/**
 * Runs the engine for a machine and a stored duty cycle and returns the columns of the estimate
 * row: frozen inputs, versions, result and the summary figures lists sort by. Throws
 * MissingSurfaceMixError (turns without a surface, no site) and the engine's own errors.
 */
export function buildEstimateRecord({
  machine,
  cycle,
  turns,
  straight,
  site,
  title,
}: {
  machine: { id: string; name: string; version: number; spec: unknown; customerId: string | null };
  cycle: { id: string; name: string; version: number; customerId: string; source: string };
  turns: ReturnType<typeof toStoredTurn>[];
  straight: TStraight | null;
  site: { id: string; surfaceMix: unknown } | null;
  title?: string;
}) {
  const mix = (site?.surfaceMix ?? null) as Partial<Record<TSurfaceKind, number>> | null;
  const filled = fillSurfaces(turns, mix);
  const spec = machine.spec as TMachineInput;
  // Long logs are merged into kinds of turn; schedules and builder cycles keep every row.
  const dutyCycle = toEngineDutyCycle({
    name: cycle.name,
    // Renumbered: a turn split across the site's surfaces must stay several kinds.
    turns: filled.map((t, i) => ({ ...t, seq: i })),
    straight: straightWithMix(straight, mix),
    mergeKinds: cycle.source === "telematics",
  });
  const options = { turnDetail: dutyCycle.turns.length <= TURN_DETAIL_LIMIT };
  const result: TEstimateResult = estimate(spec, dutyCycle, options);
  const first = result.positions.find((p) => p.wearsFirst) ?? null;
  return {
    customerId: machine.customerId ?? cycle.customerId,
    machineId: machine.id,
    dutyCycleId: cycle.id,
    dutyCycleVersion: cycle.version,
    siteId: site?.id ?? null,
    title: title || `${machine.name} · ${cycle.name}`,
    machineName: machine.name,
    dutyCycleName: cycle.name,
    machineVersion: machine.version,
    engineVersion: ENGINE_VERSION,
    inputs: { machine: spec, dutyCycle, options, surfaceMix: mix },
    result,
    costPerHour: Number.isFinite(result.costPerHour) ? result.costPerHour : null,
    hoursToFirstReplacement: first?.hoursToReplacement ?? null,
    firstToWear: result.firstToWear,
    warningCount: result.warnings.length,
  };
}
