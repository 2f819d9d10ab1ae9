import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import { calibratedEngineInputs, type TCalibrationRecord } from "@/lib/calibration";
import {
  estimate,
  type TDutyCycleInput,
  type TEstimateOptions,
  type TMachineInput,
} from "@/lib/scrub";
import { can } from "@/lib/authz/policy";
import { CalibrationError, forbidden } from "@/features/calibration/server/errors";
import { getMachineCalibration } from "@/features/calibration/server/get-machine-calibration";

/**
 * Re-runs the machine's latest estimate with its calibration applied and stores it as a new
 * estimate whose inputs record the calibration: the result says it is calibrated and on what data.
 */
export async function createCalibratedEstimate({
  db,
  actor,
  machineId,
}: {
  db: DbOrTx;
  actor: TActor;
  machineId: string;
}): Promise<{ id: string; calibration: TCalibrationRecord }> {
  if (!can(actor, "estimate:run")) throw forbidden("estimates");
  const cal = await getMachineCalibration({ db, actor, machineId });
  const c = cal.fleet?.calibration;
  if (!cal.basis || !c) {
    throw new CalibrationError(
      409,
      "conflict",
      "Run an estimate for this machine first: the calibration scales its wear figures.",
    );
  }
  if (c.source === "none") {
    throw new CalibrationError(
      409,
      "not_calibrated",
      `This machine cannot be calibrated yet. ${c.own.reason}`,
    );
  }
  const [basis] = await db
    .select()
    .from(estimates)
    .where(
      and(eq(estimates.id, cal.basis.estimateId), eq(estimates.dealershipId, actor.dealershipId)),
    );
  if (!basis)
    throw new CalibrationError(
      409,
      "conflict",
      "The machine's estimate was deleted; run it again.",
    );
  const inputs = basis.inputs as {
    machine: TMachineInput;
    dutyCycle: TDutyCycleInput;
    options: TEstimateOptions;
  } & Record<string, unknown>;
  const scaled = calibratedEngineInputs(inputs.machine, inputs.options ?? {}, c.multipliers);
  const result = estimate(scaled.machine, inputs.dutyCycle, scaled.options);
  const calibration: TCalibrationRecord = {
    source: c.source,
    multipliers: c.multipliers,
    r2: c.fit.quality.r2,
    rmse: c.fit.quality.rmse,
    n: c.fit.quality.n,
    hoursCovered: c.fit.quality.hoursCovered,
    pooledMachines: c.pooledMachines ?? null,
    basisEstimateId: basis.id,
  };
  const first = result.positions.find((p) => p.wearsFirst) ?? null;
  const [row] = await db
    .insert(estimates)
    .values({
      dealershipId: actor.dealershipId,
      customerId: basis.customerId,
      machineId: basis.machineId,
      dutyCycleId: basis.dutyCycleId,
      dutyCycleVersion: basis.dutyCycleVersion,
      siteId: basis.siteId,
      title: `${basis.title} · calibrated`,
      machineName: basis.machineName,
      dutyCycleName: basis.dutyCycleName,
      machineVersion: basis.machineVersion,
      engineVersion: result.engineVersion,
      inputs: { ...inputs, machine: scaled.machine, options: scaled.options, calibration },
      result,
      costPerHour: Number.isFinite(result.costPerHour) ? result.costPerHour : null,
      hoursToFirstReplacement: first?.hoursToReplacement ?? null,
      firstToWear: result.firstToWear,
      warningCount: result.warnings.length,
      createdById: actor.userId,
    })
    .returning({ id: estimates.id });
  return { id: row!.id, calibration };
}
