import { z } from "zod";
import type { TEstimateResult } from "@/lib/scrub";
import type { TTurnTrait } from "@/features/estimates/lib/turn-kinds";

export const ZEstimateCreate = z.object({
  machineId: z.uuid("machineId must be the id of one of your machines."),
  dutyCycleId: z.uuid("dutyCycleId must be the id of a duty cycle."),
  /** Site whose surface mix fills in turns logged without a surface. */
  siteId: z
    .uuid("siteId must be the id of one of the customer's sites.")
    .nullish()
    .transform((v) => v ?? null),
  title: z.string().trim().max(160, "Title must be at most 160 characters.").optional(),
});
export type TEstimateCreate = z.input<typeof ZEstimateCreate>;

export type TEstimateRow = {
  id: string;
  title: string;
  customerId: string | null;
  customerName: string | null;
  machineId: string;
  machineName: string;
  dutyCycleName: string;
  costPerHour: number | null;
  hoursToFirstReplacement: number | null;
  firstToWear: string | null;
  warningCount: number;
  createdAt: string;
};

export type TEstimateDto = TEstimateRow & {
  dutyCycleId: string | null;
  dutyCycleVersion: number;
  siteId: string | null;
  machineVersion: number;
  engineVersion: string;
  result: TEstimateResult;
  /** Direction, surface, speed, load and steering of each turn kind (index-aligned with result.turns). */
  turnTraits: TTurnTrait[];
};

/** An estimate's result never changes; only its title may. */
export const ZEstimatePatch = z.strictObject(
  {
    title: z
      .string({ error: "title must be text." })
      .trim()
      .min(1, "Give the estimate a title.")
      .max(160, "Title must be at most 160 characters."),
  },
  {
    error: (issue) =>
      issue.code === "unrecognized_keys"
        ? "Only the title of an estimate can change; run a new estimate for other inputs."
        : undefined,
  },
);
export type TEstimatePatch = z.input<typeof ZEstimatePatch>;
