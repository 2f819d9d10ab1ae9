import { z } from "zod";
import { ZSurfaceKind } from "@/lib/scrub/schemas";
import {
  FILE_KINDS,
  SCHEDULE_ROLES,
  TELEMATICS_ROLES,
  UNITS,
  mappingProblems,
  type TColumnMapping,
} from "@/lib/duty-cycles/column-mapping";

const ZColumnRef = z.object({
  index: z.number().int().min(0).max(499),
  header: z.string().max(200).optional(),
  unit: z.enum(UNITS),
});

const roles = [...new Set([...TELEMATICS_ROLES, ...SCHEDULE_ROLES])] as [string, ...string[]];

/** A column mapping as the browser sends it and as templates store it. */
export const ZColumnMapping = z
  .object({
    kind: z.enum(FILE_KINDS),
    delimiter: z
      .string()
      .min(1, "Choose the field separator.")
      .max(1, "The field separator is one character.")
      .refine(
        (d) => d !== '"' && d !== "\n" && d !== "\r",
        "That character cannot separate fields.",
      ),
    decimal: z.enum([".", ","]),
    hasHeader: z.boolean(),
    encoding: z.enum(["utf-8", "latin1"]),
    columns: z.partialRecord(z.enum(roles), ZColumnRef),
    defaults: z.object({
      surface: ZSurfaceKind,
      loadState: z.enum(["laden", "unladen"]),
      shiftHours: z.number().positive().max(24).default(8),
      wheelbase: z.number().positive().max(15).optional(),
      maxSpeed: z
        .number()
        .positive()
        .max(40, "A top speed above 40 m/s (144 km/h) is not a machine's.")
        .default(25),
      straightDistancePerHour: z.number().nonnegative().max(100_000).optional(),
      straightSpeed: z.number().nonnegative().max(20).optional(),
    }),
  })
  .superRefine((m, ctx) => {
    const kindRoles: readonly string[] =
      m.kind === "telematics" ? TELEMATICS_ROLES : SCHEDULE_ROLES;
    for (const role of Object.keys(m.columns))
      if (!kindRoles.includes(role))
        ctx.addIssue({
          code: "custom",
          path: ["columns", role],
          message: `A ${m.kind} file has no "${role}" column.`,
        });
    for (const message of mappingProblems(m as TColumnMapping))
      ctx.addIssue({ code: "custom", path: ["columns"], message });
  });

export type TColumnMappingInput = z.input<typeof ZColumnMapping>;
