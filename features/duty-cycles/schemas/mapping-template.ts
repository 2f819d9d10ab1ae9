import { z } from "zod";
import { ZColumnMapping } from "@/features/duty-cycles/schemas/column-mapping";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";

const name = z.string().trim().min(1, "Name the template.").max(80, "At most 80 characters.");

export const ZCreateMappingTemplate = z.object({ name, mapping: ZColumnMapping });
export const ZUpdateMappingTemplate = z
  .object({ name: name.optional(), mapping: ZColumnMapping.optional() })
  .refine((u) => u.name !== undefined || u.mapping !== undefined, "Nothing to change.");

export const ZMappingTemplateListQuery = z.object({
  kind: z.enum(["telematics", "schedule"]).optional(),
  q: z.string().trim().max(80).optional(),
  sort: z.enum(["name", "updatedAt"]).default("name"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(50),
});

export type TMappingTemplate = {
  id: string;
  name: string;
  kind: "telematics" | "schedule";
  mapping: TColumnMapping;
  updatedAt: string;
};
