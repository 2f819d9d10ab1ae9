import { z } from "zod";
import { ZSurfaceKind, type TSurfaceKind } from "@/lib/scrub";

export const SURFACE_LABELS: Record<TSurfaceKind, string> = {
  "concrete-asphalt": "Concrete or asphalt",
  gravel: "Gravel or hardcore",
  "firm-soil": "Firm soil",
  "loose-soil": "Loose or tilled soil",
  grass: "Grass",
};

/** Shares of ground worked on; fractions that add up to 1 (within half a percent). */
export const ZSurfaceMix = z
  .partialRecord(
    ZSurfaceKind,
    z
      .number({ error: "Each share must be a number from 0 to 1." })
      .min(0, "A share cannot be negative.")
      .max(1, "A share cannot exceed 1 (100 %)."),
  )
  .refine((mix) => Object.values(mix).some((v) => (v ?? 0) > 0), {
    message: "Give at least one surface a share above 0.",
  })
  .refine(
    (mix) => Math.abs(Object.values(mix).reduce<number>((s, v) => s + (v ?? 0), 0) - 1) <= 0.005,
    { message: "The surface shares must add up to 100 %." },
  );
export type TSurfaceMix = z.infer<typeof ZSurfaceMix>;

export const ZSiteInput = z.object({
  customerId: z.uuid("customerId must be the id of one of your customers."),
  name: z
    .string({ error: "name is required." })
    .trim()
    .min(1, "Give the site a name.")
    .max(120, "Name must be at most 120 characters."),
  surfaceMix: ZSurfaceMix,
  notes: z.string().max(5000, "Notes must be at most 5000 characters.").default(""),
});
export type TSiteInput = z.input<typeof ZSiteInput>;

export const ZSitePatch = ZSiteInput.omit({ customerId: true })
  .partial()
  .refine((v) => Object.keys(v).length > 0, "Send at least one field to change.");
export type TSitePatch = z.input<typeof ZSitePatch>;

export type TSiteDto = {
  id: string;
  customerId: string;
  customerName: string;
  name: string;
  surfaceMix: TSurfaceMix;
  notes: string;
  createdAt: string;
  updatedAt: string;
};
