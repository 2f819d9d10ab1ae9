import { z } from "zod";

export const CUSTOMER_KINDS = [
  "farm",
  "contractor",
  "council",
  "estate",
  "utility",
  "other",
] as const;
export const ZCustomerKind = z.enum(CUSTOMER_KINDS, {
  error: `kind must be one of: ${CUSTOMER_KINDS.join(", ")}.`,
});

const optionalEmail = z
  .union([z.literal(""), z.email("Enter an e-mail address like name@example.test.")])
  .optional()
  .transform((v) => (v ? v : undefined));
const optionalShort = (label: string, max = 120) =>
  z
    .string()
    .trim()
    .max(max, `${label} must be at most ${max} characters.`)
    .optional()
    .transform((v) => (v ? v : undefined));

export const ZContact = z.object({
  name: z.string().trim().min(1, "Each contact needs a name.").max(120),
  role: optionalShort("Role", 80),
  email: optionalEmail,
  phone: optionalShort("Phone", 40),
});
export type TContact = z.input<typeof ZContact>;

export const ZCustomerInput = z.object({
  name: z
    .string({ error: "name is required." })
    .trim()
    .min(1, "Give the customer a name.")
    .max(120, "Name must be at most 120 characters."),
  kind: ZCustomerKind.default("farm"),
  contactName: optionalShort("Contact name"),
  contactEmail: optionalEmail,
  contactPhone: optionalShort("Phone", 40),
  contacts: z.array(ZContact).max(20, "At most 20 further contacts.").default([]),
  notes: z.string().max(5000, "Notes must be at most 5000 characters.").default(""),
});
export type TCustomerInput = z.input<typeof ZCustomerInput>;
export type TCustomerValues = z.output<typeof ZCustomerInput>;

/** Update: any subset of the fields; at least one. */
export const ZCustomerPatch = ZCustomerInput.partial().refine(
  (v) => Object.keys(v).length > 0,
  "Send at least one field to change.",
);
export type TCustomerPatch = z.input<typeof ZCustomerPatch>;

/** A customer as the API returns it. */
export type TCustomerDto = {
  id: string;
  name: string;
  kind: string;
  contactName: string | null;
  contactEmail: string | null;
  contactPhone: string | null;
  contacts: TContact[];
  notes: string;
  createdAt: string;
  updatedAt: string;
};

/** A row of the customers list. */
export type TCustomerRow = Pick<
  TCustomerDto,
  "id" | "name" | "kind" | "contactName" | "updatedAt"
> & {
  machineCount: number;
  siteCount: number;
};
