import "server-only";
import type { TEstimate } from "@/db/schema";
import type { TEstimateResult } from "@/lib/scrub";
import type { TEstimateDto, TEstimateRow } from "@/features/estimates/schemas/estimate";
import { iso } from "@/features/platform";
import { turnTraitsFromInputs, type TTurnTrait } from "@/features/estimates/lib/turn-kinds";

export function toEstimateRow(
  row: Pick<
    TEstimate,
    | "id"
    | "title"
    | "customerId"
    | "machineId"
    | "machineName"
    | "dutyCycleName"
    | "costPerHour"
    | "hoursToFirstReplacement"
    | "firstToWear"
    | "warningCount"
    | "createdAt"
  >,
  customerName: string | null,
): TEstimateRow {
  return {
    id: row.id,
    title: row.title,
    customerId: row.customerId,
    customerName,
    machineId: row.machineId,
    machineName: row.machineName,
    dutyCycleName: row.dutyCycleName,
    costPerHour: row.costPerHour,
    hoursToFirstReplacement: row.hoursToFirstReplacement,
    firstToWear: row.firstToWear,
    warningCount: row.warningCount,
    createdAt: iso(row.createdAt),
  };
}

export function toEstimateDto(row: TEstimate, customerName: string | null): TEstimateDto {
  return {
    ...toEstimateRow(row, customerName),
    dutyCycleId: row.dutyCycleId,
    dutyCycleVersion: row.dutyCycleVersion,
    siteId: row.siteId,
    machineVersion: row.machineVersion,
    engineVersion: row.engineVersion,
    result: row.result as TEstimateResult,
    turnTraits: turnTraitsFromInputs(row.inputs, defaultLayout(row.inputs)),
  };
}

/** The machine's own steering layout from the frozen inputs (turns without a mode use it). */
function defaultLayout(inputs: unknown) {
  const layout = (inputs as { machine?: { steering?: { layout?: string } } } | null)?.machine
    ?.steering?.layout;
  return (layout ?? "trapezoid") as TTurnTrait["steeringMode"];
}
