import { z } from "zod";
import { ZColumnMapping } from "@/features/duty-cycles/schemas/column-mapping";
import { ZBuilderInput } from "@/features/duty-cycles/schemas/builder";
import type { TDutyCycleSummary } from "@/lib/duty-cycles/summarise";
import type { TStoredTurn, TStraight } from "@/lib/duty-cycles/stored-duty-cycle";

export const MAX_PAGE_SIZE = 100;

const name = z
  .string()
  .trim()
  .min(1, "Give the duty cycle a name.")
  .max(120, "At most 120 characters.");

export const ZDutyCycleListQuery = z.object({
  page: z.coerce.number().int().min(1, "page must be 1 or more.").default(1),
  pageSize: z.coerce
    .number()
    .int()
    .min(1)
    .max(MAX_PAGE_SIZE, `pageSize must be at most ${MAX_PAGE_SIZE}.`)
    .default(25),
  sort: z
    .enum(["createdAt", "name", "status", "operatingHours"], {
      error: "sort must be one of: createdAt, name, status, operatingHours.",
    })
    .default("createdAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  q: z.string().trim().max(100).optional(),
  status: z.enum(["pending", "processing", "ready", "failed"]).optional(),
  source: z.enum(["telematics", "schedule", "builder"]).optional(),
  customerId: z.uuid("customerId must be an id.").optional(),
});
export type TDutyCycleListQuery = z.infer<typeof ZDutyCycleListQuery>;

/** Create from an uploaded file, or from the builder. */
export const ZCreateDutyCycle = z.discriminatedUnion("source", [
  z.object({
    source: z.literal("upload"),
    name,
    customerId: z.uuid("Choose the customer."),
    machineId: z.uuid().nullish(),
    uploadId: z.uuid("Upload the file first."),
    mapping: ZColumnMapping,
  }),
  z.object({
    source: z.literal("builder"),
    name,
    customerId: z.uuid("Choose the customer."),
    machineId: z.uuid().nullish(),
    builder: ZBuilderInput,
  }),
]);
export type TCreateDutyCycle = z.infer<typeof ZCreateDutyCycle>;
export type TCreateDutyCycleInput = z.input<typeof ZCreateDutyCycle>;

export const ZUpdateDutyCycle = z
  .object({
    name: name.optional(),
    customerId: z.uuid().optional(),
    machineId: z.uuid().nullable().optional(),
    /** Builder cycles only: rebuild from new inputs. */
    builder: ZBuilderInput.optional(),
    /** Optimistic concurrency: the version the editor started from. */
    version: z.number().int().positive(),
  })
  .refine((u) => Object.keys(u).length > 1, "Nothing to change.");
export type TUpdateDutyCycle = z.infer<typeof ZUpdateDutyCycle>;
export type TUpdateDutyCycleInput = z.input<typeof ZUpdateDutyCycle>;

export type TDutyCycleStatus = "pending" | "processing" | "ready" | "failed";

export type TDutyCycleRow = {
  id: string;
  name: string;
  customerId: string;
  customerName: string;
  machineId: string | null;
  source: "telematics" | "schedule" | "builder";
  status: TDutyCycleStatus;
  progress: number;
  operatingHours: number | null;
  turnsPerHour: number | null;
  createdAt: string;
  updatedAt: string;
};

export type TDutyCycleDetail = TDutyCycleRow & {
  failureReason: string | null;
  summary: TDutyCycleSummary | null;
  straight: TStraight | null;
  rowsUsed: number;
  rowsSkipped: number;
  attempts: number;
  /** Times the import was queued again because the worker running it stopped. */
  interruptions: number;
  version: number;
  builderInput: unknown;
  notes: string[];
  upload: { originalName: string; sizeBytes: number; sha256: string; uploadedAt: string } | null;
  /** The first turns in order (up to 200), for the table on the detail page. */
  turns: TStoredTurn[];
  turnCount: number;
};

export type TPage<T> = {
  items: T[];
  page: number;
  pageSize: number;
  total: number;
  pageCount: number;
};
