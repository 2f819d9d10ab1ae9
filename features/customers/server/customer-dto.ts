import "server-only";
import type { TCustomer } from "@/db/schema";
import type { TCustomerDto } from "@/features/customers/schemas/customer";
import { iso } from "@/features/platform";

export function toCustomerDto(row: TCustomer): TCustomerDto {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    contactName: row.contactName,
    contactEmail: row.contactEmail,
    contactPhone: row.contactPhone,
    contacts: row.contacts,
    notes: row.notes,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
  };
}
