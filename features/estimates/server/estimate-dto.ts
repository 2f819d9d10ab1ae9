import "server-only";
import type { TEstimate } from "@/db/schema";
import type { TEstimateResult } from "@/lib/scrub";
import type { TEstimateDto, TEstimateRow } from "@/features/estimates/schemas/estimate";
import { iso } from "@/features/platform";

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
  };
}
