import { z } from "zod";
import { ZSurfaceKind } from "@/lib/scrub/schemas";
import { HEADLAND_TURNS } from "@/lib/duty-cycles/builder";

const share = z.number().min(0, "Share cannot be negative.").max(1, "Share is at most 1 (100 %).");
const speed = (what: string) =>
  z
    .number()
    .positive(`${what} must be above 0.`)
    .max(20, `${what} above 20 m/s (72 km/h) is not a working speed.`);
const label = z.string().trim().min(1, "Name the block.").max(60);

export const ZFieldBlock = z.object({
  kind: z.literal("field"),
  label,
  share,
  surface: ZSurfaceKind,
  runLength: z.number().min(10, "A field run shorter than 10 m is not a field run.").max(5000),
  workingWidth: z.number().min(0.5, "Working width is at least 0.5 m.").max(60),
  workingSpeed: speed("Working speed"),
  turnSpeed: speed("Headland turn speed"),
  headlandTurn: z.enum(HEADLAND_TURNS),
  laden: z.boolean(),
});

export const ZYardBlock = z.object({
  kind: z.literal("yard"),
  label,
  share,
  surface: ZSurfaceKind,
  cyclesPerHour: z.number().min(0).max(300, "More than 300 cycles an hour is not plausible."),
  turns: z
    .array(
      z.object({
        headingChange: z.number().positive().max(720),
        radius: z.number().min(0).max(100),
        reverse: z.boolean(),
        laden: z.boolean(),
      }),
    )
    .min(1, "A cycle has at least one turn.")
    .max(12),
  travelPerCycle: z.number().min(0).max(5000),
  speed: speed("Speed"),
});

export const ZRoadBlock = z.object({
  kind: z.literal("road"),
  label,
  share,
  surface: ZSurfaceKind,
  speed: speed("Road speed"),
  bendShare: z.number().min(0).max(1),
  bendRadius: z.number().min(5, "A road bend is at least 5 m in radius.").max(2000),
  bendAngle: z.number().positive().max(180),
  laden: z.boolean(),
});

export const ZBuilderInput = z
  .object({
    minTurningRadius: z.number().positive("Give the machine's tightest turning radius.").max(50),
    blocks: z
      .array(z.discriminatedUnion("kind", [ZFieldBlock, ZYardBlock, ZRoadBlock]))
      .min(1)
      .max(8),
  })
  .superRefine((b, ctx) => {
    const total = sharesTotal(b.blocks);
    // Half a tenth of a percent covers rounding in the form's percent fields.
    if (Math.abs(total - 1) > 0.0005)
      ctx.addIssue({
        code: "custom",
        message: `The blocks' shares of the operating hours add up to ${formatShare(total)}; make them add up to 100 %.`,
        path: ["blocks"],
      });
  });

/** Sum of the blocks' shares of the hours (1 = 100 %). */
export function sharesTotal(blocks: readonly { share: number }[]): number {
  return blocks.reduce((s, x) => s + (Number.isFinite(x.share) ? x.share : 0), 0);
}

/** A share as the form shows it: "115 %", "99.5 %". */
export function formatShare(share: number): string {
  return `${Math.round(share * 1000) / 10} %`;
}
export type TBuilderInputForm = z.input<typeof ZBuilderInput>;
