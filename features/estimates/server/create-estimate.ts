import "server-only";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { ZEstimateCreate, type TEstimateDto } from "@/features/estimates/schemas/estimate";
import { assertMayRunEstimates } from "@/features/platform";
import { invalidReference, parseOrThrow, ApiError } from "@/features/platform";
import { loadMachine } from "@/features/machines";
import { loadSite } from "@/features/customers";
import { loadDutyCycleForEstimate } from "@/features/estimates/server/load-duty-cycle";
import { MissingSurfaceMixError } from "@/features/customers";
import { buildEstimateRecord } from "@/features/estimates/lib/estimate-record";
import { toEstimateDto } from "@/features/estimates/server/estimate-dto";

async function asField<T>(field: string, run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof ApiError && e.status === 404)
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

  let record;
  try {
    record = buildEstimateRecord({ machine, cycle, turns, straight, site, title: values.title });
  } catch (e) {
    if (e instanceof MissingSurfaceMixError) throw invalidReference("siteId", e.message);
    throw new ApiError(
      422,
      "estimate_failed",
      `The engine could not estimate this combination: ${(e as Error).message}`,
    );
  }
  const [row] = await db
    .insert(estimates)
    .values({ ...record, dealershipId: actor.dealershipId, createdById: actor.userId })
    .returning();
  if (!row) throw new Error("insert returned no estimate");
  return toEstimateDto(row, machine.customerId ? customerName : null);
}
