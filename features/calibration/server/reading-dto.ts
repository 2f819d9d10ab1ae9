import "server-only";
import type { TTreadReading } from "@/db/schema";
import type { TReadingDto } from "@/features/calibration/schemas/reading";

export function toReadingDto(r: TTreadReading, photoIds: string[] = []): TReadingDto {
  return {
    id: r.id,
    machineId: r.machineId,
    position: r.position as TReadingDto["position"],
    kind: r.kind === "fitted" ? "fitted" : "reading",
    measuredOn: r.measuredOn,
    hourMeter: r.hourMeter,
    depthCentre: r.depthCentre,
    depthInner: r.depthInner,
    depthOuter: r.depthOuter,
    designation: r.designation,
    measuredBy: r.measuredBy,
    note: r.note,
    photoIds,
    createdAt: r.createdAt.toISOString(),
  };
}
