import type { TDutyCycle } from "@/db/schema";
import type { TDutyCycleRow } from "@/features/duty-cycles/schemas/duty-cycle";
import type { TDutyCycleSummary } from "@/lib/duty-cycles/summarise";

export function toDutyCycleRow(c: TDutyCycle, customerName: string): TDutyCycleRow {
  const summary = c.summary as TDutyCycleSummary | null;
  return {
    id: c.id,
    name: c.name,
    customerId: c.customerId,
    customerName,
    machineId: c.machineId,
    source: c.source,
    status: c.status,
    progress: c.progress,
    operatingHours: c.operatingHours,
    turnsPerHour: summary?.turnsPerHour ?? null,
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}
