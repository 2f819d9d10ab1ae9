import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { can } from "@/lib/authz/policy";
import { ZMachine, type TEstimateResult, type TMachine, type TMachineInput } from "@/lib/scrub";
import { notFound } from "@/features/platform";
import { assertMayRun } from "./access";

/** What the "try another setup" and sweep screens start from: an estimate's frozen machine. */
export interface TSetupBase {
  estimateId: string;
  estimateTitle: string;
  machineId: string;
  machineName: string;
  customerId: string | null;
  dutyCycleName: string;
  costPerHour: number | null;
  /** The machine exactly as the estimate ran it (SI), so the changes offered fit its layout. */
  machine: TMachine;
  /** Standing cautions of the estimate, shown beside the options. */
  cautions: TEstimateResult["cautions"];
}

/** The frozen machine of an estimate the actor may run studies on (404 otherwise, 403 for readers). */
export async function readSetupBase({
  db,
  actor,
  estimateId,
}: {
  db: DbOrTx;
  actor: TActor;
  estimateId: string;
}): Promise<TSetupBase> {
  assertMayRun(actor);
  const [row] = await db
    .select()
    .from(estimates)
    .where(and(eq(estimates.id, estimateId), eq(estimates.dealershipId, actor.dealershipId)));
  if (!row || !can(actor, "estimate:read", row)) throw notFound("estimate");
  const frozen = row.inputs as { machine: TMachineInput };
  return {
    estimateId: row.id,
    estimateTitle: row.title,
    machineId: row.machineId,
    machineName: row.machineName,
    customerId: row.customerId,
    dutyCycleName: row.dutyCycleName,
    costPerHour: row.costPerHour,
    machine: ZMachine.parse(frozen.machine),
    cautions: (row.result as TEstimateResult).cautions,
  };
}
