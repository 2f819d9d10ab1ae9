import { z } from "zod";
import { ZMachine, type TMachineInput } from "@/lib/scrub";

export const MACHINE_KINDS = [
  "tractor",
  "loader",
  "skid-steer",
  "telehandler",
  "combine",
  "forklift",
  "wagon",
  "mower",
  "sprayer",
  "other",
] as const;
export const ZMachineKind = z.enum(MACHINE_KINDS, {
  error: `kind must be one of: ${MACHINE_KINDS.join(", ")}.`,
});

/** A machine profile: who owns it (null = dealership template), what it is, and the engine input. */
export const ZMachineRecordInput = z.object({
  customerId: z
    .uuid("customerId must be the id of one of your customers, or null for a template.")
    .nullable(),
  kind: ZMachineKind,
  spec: ZMachine,
});
export type TMachineRecordInput = z.input<typeof ZMachineRecordInput>;

export const ZMachineRecordPatch = ZMachineRecordInput.partial().refine(
  (v) => Object.keys(v).length > 0,
  "Send at least one field to change.",
);
export type TMachineRecordPatch = z.input<typeof ZMachineRecordPatch>;

export const ZCopyTemplateInput = z.object({
  customerId: z.uuid("customerId must be the id of one of your customers."),
  name: z.string().trim().min(1, "Give the copy a name.").max(120).optional(),
});

export type TMachineDto = {
  id: string;
  customerId: string | null;
  customerName: string | null;
  name: string;
  kind: string;
  layout: string;
  spec: TMachineInput;
  templateId: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
};

export type TMachineRow = Omit<TMachineDto, "spec" | "templateId" | "createdAt"> & {
  estimateCount: number;
};
