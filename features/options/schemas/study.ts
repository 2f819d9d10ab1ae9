import { z } from "zod";
import type { TPage } from "@/lib/query/list-query";
import { ZOptionSpec, ZSweepSpec, type TComparisonResult, type TSweepResult } from "@/lib/scrub";

export const ZStudyKind = z.enum(["comparison", "sweep"]);
export type TStudyKind = z.infer<typeof ZStudyKind>;

/** Body of POST /api/v1/comparisons: options against an estimate's machine and duty cycle. */
export const ZComparisonCreate = z.object({
  estimateId: z.uuid(),
  title: z.string().trim().max(200).optional(),
  options: z.array(ZOptionSpec).min(1).max(4),
  /** Operating hours over which cost is totalled. */
  hours: z.number().positive().max(100_000).default(2000),
});
export type TComparisonCreate = z.input<typeof ZComparisonCreate>;

/** Body of POST /api/v1/sweeps. */
export const ZSweepCreate = z.object({
  estimateId: z.uuid(),
  title: z.string().trim().max(200).optional(),
  sweep: ZSweepSpec,
});
export type TSweepCreate = z.input<typeof ZSweepCreate>;

/** List query: paging and the machine, customer, estimate or series a list is narrowed to. */
export const ZStudyListQuery = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
  machineId: z.uuid().optional(),
  customerId: z.uuid().optional(),
  estimateId: z.uuid().optional(),
  /** Every version of one study: the id of its series (its first version). */
  seriesId: z.uuid().optional(),
  /** Text the title contains (the list's search box). */
  q: z
    .string()
    .trim()
    .max(100, "Search text must be at most 100 characters.")
    .optional()
    .transform((v) => (v ? v : undefined)),
});

/** A stored study as lists show it. */
export interface TStudyRow {
  id: string;
  kind: TStudyKind;
  seriesId: string;
  version: number;
  title: string;
  customerId: string | null;
  machineId: string;
  machineName: string;
  estimateId: string | null;
  engineVersion: string;
  currentCostPerHour: number | null;
  bestCostPerHour: number | null;
  createdAt: string;
}

/**
 * A stored comparison (what reports read): the row plus the frozen engine result. Money is in
 * the dealership's own currency (prices as entered on the machine), costs per operating hour.
 */
export interface TComparisonDto extends TStudyRow {
  kind: "comparison";
  hours: number;
  result: TComparisonResult;
}

export interface TSweepDto extends TStudyRow {
  kind: "sweep";
  result: TSweepResult;
}

/** A page of a list, the shape every list route answers. */
export type TStudyPage<T> = TPage<T>;
