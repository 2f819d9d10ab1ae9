import { z } from "zod";
import { TYRE_POSITIONS } from "@/lib/calibration";

/** Depths are mm; the form converts from inches for imperial users before sending. */
const depth = z
  .number({ error: "Enter the depth in mm." })
  .min(0, "A depth cannot be negative.")
  .max(150, "Deeper than any agricultural tread (150 mm): check the unit.");

const optionalDepth = depth.nullable().optional();

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-29.")
  .refine((v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)), "Not a calendar date.");

export const ZReadingCreate = z
  .object({
    position: z.enum(TYRE_POSITIONS, { error: "Pick a tyre position." }),
    kind: z.enum(["reading", "fitted"]).default("reading"),
    measuredOn: isoDate.refine(
      (v) => v <= new Date(Date.now() + 86_400_000).toISOString().slice(0, 10),
      "The date is in the future.",
    ),
    hourMeter: z
      .number({ error: "Enter the hour-meter reading." })
      .min(0, "The hour meter cannot be negative.")
      .max(200_000, "More than 200,000 hours: check the hour meter."),
    depthCentre: depth,
    depthInner: optionalDepth,
    depthOuter: optionalDepth,
    designation: z.string().trim().max(60).nullable().optional(),
    measuredBy: z.string().trim().min(1, "Say who measured.").max(120),
    note: z.string().trim().max(1000).default(""),
  })
  .refine((v) => v.kind !== "fitted" || !!v.designation, {
    path: ["designation"],
    message: "A tyre change needs the new tyre's size.",
  });
export type TReadingCreate = z.output<typeof ZReadingCreate>;

export type TReadingDto = {
  id: string;
  machineId: string;
  position: (typeof TYRE_POSITIONS)[number];
  kind: "reading" | "fitted";
  measuredOn: string;
  hourMeter: number;
  depthCentre: number;
  depthInner: number | null;
  depthOuter: number | null;
  designation: string | null;
  measuredBy: string;
  note: string;
  photoIds: string[];
  createdAt: string;
};

/** A photo is accepted when its bytes are a JPEG or PNG and it is no bigger than this. */
export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const PHOTOS_PER_READING = 4;
