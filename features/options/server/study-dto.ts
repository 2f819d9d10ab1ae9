import "server-only";
import type { TOptionStudy } from "@/db/schema";
import type { TComparisonResult, TSweepResult } from "@/lib/scrub";
import type { TComparisonDto, TStudyRow, TSweepDto } from "../schemas/study";

export function toStudyRow(row: TOptionStudy): TStudyRow {
  return {
    id: row.id,
    kind: row.kind === "sweep" ? "sweep" : "comparison",
    seriesId: row.seriesId,
    version: row.version,
    title: row.title,
    customerId: row.customerId,
    machineId: row.machineId,
    machineName: row.machineName,
    estimateId: row.estimateId,
    engineVersion: row.engineVersion,
    currentCostPerHour: row.currentCostPerHour,
    bestCostPerHour: row.bestCostPerHour,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toComparisonDto(row: TOptionStudy): TComparisonDto {
  const result = row.result as TComparisonResult;
  return { ...toStudyRow(row), kind: "comparison", hours: result.hours, result };
}

export function toSweepDto(row: TOptionStudy): TSweepDto {
  return { ...toStudyRow(row), kind: "sweep", result: row.result as TSweepResult };
}
