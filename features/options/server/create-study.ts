import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/client";
import { estimates, optionStudies } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TDutyCycleInput, TEstimateOptions, TMachineInput } from "@/lib/scrub";
import { ZComparisonCreate, ZSweepCreate, type TStudyKind } from "../schemas/study";
import { can } from "@/lib/authz/policy";
import { assertMayRun } from "./access";
import { ApiError, parseOrThrow } from "@/features/platform";
import type { TCalibrationRecord } from "@/lib/calibration";
import { runStudy, type TStudyInputs } from "./run-study";
import { PARAMETER_LABELS } from "../lib/setup-choices";

/**
 * Runs a comparison or sweep against an estimate's frozen machine and duty cycle and stores
 * inputs, engine version and result as version 1 of a new series.
 */
export async function createStudy({
  db,
  actor,
  kind,
  input,
}: {
  db: DbOrTx;
  actor: TActor;
  kind: TStudyKind;
  input: unknown;
}) {
  assertMayRun(actor);
  const body =
    kind === "comparison"
      ? parseOrThrow(ZComparisonCreate, input)
      : parseOrThrow(ZSweepCreate, input);
  const [source] = await db
    .select()
    .from(estimates)
    .where(and(eq(estimates.id, body.estimateId), eq(estimates.dealershipId, actor.dealershipId)));
  if (!source || !can(actor, "estimate:read", source)) {
    const message = "No estimate with that id in your workspace.";
    throw new ApiError(400, "invalid_input", `Please fix the input. estimateId: ${message}`, {
      estimateId: [message],
    });
  }
  const frozen = source.inputs as {
    machine: TMachineInput;
    dutyCycle: TDutyCycleInput;
    options?: TEstimateOptions;
    calibration?: TCalibrationRecord | null;
  };
  const engine = {
    machine: frozen.machine,
    dutyCycle: frozen.dutyCycle,
    engineOptions: frozen.options ?? {},
    calibration: frozen.calibration ?? null,
  };
  const inputs: TStudyInputs =
    "options" in body
      ? { kind: "comparison", ...engine, options: body.options, hours: body.hours }
      : { kind: "sweep", ...engine, sweep: body.sweep };
  const run = runStudy(inputs);
  const id = crypto.randomUUID();
  const [row] = await db
    .insert(optionStudies)
    .values({
      id,
      seriesId: id,
      version: 1,
      kind,
      dealershipId: actor.dealershipId,
      customerId: source.customerId,
      machineId: source.machineId,
      estimateId: source.id,
      title: body.title || defaultTitle(source.machineName, inputs),
      machineName: source.machineName,
      inputs,
      ...run,
      createdById: actor.userId,
    })
    .returning();
  if (!row) throw new Error("insert returned no study");
  return row;
}

function defaultTitle(machineName: string, inputs: TStudyInputs): string {
  return inputs.kind === "comparison"
    ? `${machineName}: other setups`
    : `${machineName}: ${PARAMETER_LABELS[inputs.sweep.parameter].toLowerCase()} swept`;
}
