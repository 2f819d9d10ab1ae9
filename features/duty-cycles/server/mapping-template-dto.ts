import type { TMappingTemplate as TRow } from "@/db/schema";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import type { TMappingTemplate } from "@/features/duty-cycles/schemas/mapping-template";

export function toMappingTemplate(t: TRow): TMappingTemplate {
  return {
    id: t.id,
    name: t.name,
    kind: t.kind === "schedule" ? "schedule" : "telematics",
    mapping: t.mapping as TColumnMapping,
    updatedAt: t.updatedAt.toISOString(),
  };
}
