import "server-only";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ENGINE_VERSION, estimate, type TMachineInput, type TSurfaceKind } from "@/lib/scrub";
import { ZEstimateCreate, type TEstimateDto } from "@/features/workspace/schemas/estimate";
import { assertMayRunEstimates } from "@/features/workspace/server/authorize";
import { invalidReference, parseOrThrow, WorkspaceError } from "@/features/workspace/server/errors";
import { loadMachine } from "@/features/workspace/server/get-machine";
import { loadSite } from "@/features/workspace/server/get-site";
import {
  loadDutyCycleForEstimate,
  straightWithMix,
} from "@/features/workspace/server/load-duty-cycle";
import { toEngineDutyCycle } from "@/lib/duty-cycles/to-engine-duty-cycle";
import { fillSurfaces, MissingSurfaceMixError } from "@/features/workspace/lib/fill-surfaces";
import { toEstimateDto } from "@/features/workspace/server/estimate-dto";

/** Above this many turn kinds the per-wheel detail of each turn is not kept (size of the row). */
const TURN_DETAIL_LIMIT = 2000;

async function asField<T>(field: string, run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof WorkspaceError && e.status === 404)
      throw invalidReference(
        field,
        `No ${field.replace(/Id$/, "")} with that id in your workspace.`,
      );
    throw e;
  }
}

/**
 * Runs the engine for a machine and a duty cycle and stores inputs, versions and result, so the
 * estimate can be reproduced and still reads the same after the machine or duty cycle changes.
 */
export async function createEstimate({
  db,
  actor,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  input: unknown;
}): Promise<TEstimateDto> {
  assertMayRunEstimates(actor);
  const values = parseOrThrow(ZEstimateCreate, input);
  const { machine, customerName } = await asField("machineId", () =>
    loadMachine(db, actor, values.machineId, "read"),
  );
  const { cycle, turns, straight } = await loadDutyCycleForEstimate(db, actor, values.dutyCycleId);
  if (machine.customerId && cycle.customerId !== machine.customerId)
    throw invalidReference("dutyCycleId", "Pick a duty cycle of the machine's own customer.");
  const site = values.siteId
    ? (await asField("siteId", () => loadSite(db, actor, values.siteId!, "read"))).site
    : null;
  if (site && site.customerId !== cycle.customerId)
    throw invalidReference("siteId", "Pick a site of the duty cycle's customer.");
  const mix = (site?.surfaceMix ?? null) as Partial<Record<TSurfaceKind, number>> | null;

  let filled;
  try {
    filled = fillSurfaces(turns, mix);
  } catch (e) {
    if (e instanceof MissingSurfaceMixError) throw invalidReference("siteId", e.message);
    throw e;
  }
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
  let result;
  try {
    result = estimate(spec, dutyCycle, options);
  } catch (e) {
    throw new WorkspaceError(
      422,
      "estimate_failed",
      `The engine could not estimate this combination: ${(e as Error).message}`,
    );
  }
  const first = result.positions.find((p) => p.wearsFirst) ?? null;
  const [row] = await db
    .insert(estimates)
    .values({
      dealershipId: actor.dealershipId,
      customerId: machine.customerId ?? cycle.customerId,
      machineId: machine.id,
      dutyCycleId: cycle.id,
      dutyCycleVersion: cycle.version,
      siteId: site?.id ?? null,
      title: values.title || `${machine.name} · ${cycle.name}`,
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
      createdById: actor.userId,
    })
    .returning();
  if (!row) throw new Error("insert returned no estimate");
  return toEstimateDto(row, machine.customerId ? customerName : null);
}
