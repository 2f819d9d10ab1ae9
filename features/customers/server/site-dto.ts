import "server-only";
import type { TSite } from "@/db/schema";
import type { TSiteDto, TSurfaceMix } from "@/features/customers/schemas/site";
import { iso } from "@/features/platform";

export function toSiteDto(row: TSite, customerName: string): TSiteDto {
  return {
    id: row.id,
    customerId: row.customerId,
    customerName,
    name: row.name,
    surfaceMix: row.surfaceMix as TSurfaceMix,
    notes: row.notes,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
  };
}
