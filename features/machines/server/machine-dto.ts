import "server-only";
import type { TMachine as TMachineRow } from "@/db/schema";
import type { TMachineInput } from "@/lib/scrub";
import type { TMachineDto } from "@/features/machines/schemas/machine";
import { iso } from "@/features/platform";

export function toMachineDto(row: TMachineRow, customerName: string | null): TMachineDto {
  return {
    id: row.id,
    customerId: row.customerId,
    customerName,
    name: row.name,
    kind: row.kind,
    layout: row.layout,
    spec: row.spec as TMachineInput,
    templateId: row.templateId,
    version: row.version,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
  };
}
