import { z } from "zod";

/** "12,5" and "12.5" both read as 12.5: phones in some locales offer only a comma. */
const decimal = (label: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .min(1, `Enter ${label}.`)
    .transform((v) => Number(v.replace(",", ".")))
    .pipe(
      z
        .number({ error: `${label[0]!.toUpperCase()}${label.slice(1)} must be a number.` })
        .min(min, `${label[0]!.toUpperCase()}${label.slice(1)} must be at least ${min}.`)
        .max(max, `${label[0]!.toUpperCase()}${label.slice(1)} must be at most ${max}.`),
    );

/** One change as the form holds it: which change, and its fields as typed (display units). */
export const ZChangeFormValues = z.object({
  key: z.string().min(1, "Choose what to change."),
  values: z.record(z.string(), z.string()),
});

/**
 * The "try another setup" form in display units. Field contents of each change are read by
 * `readChange` (they depend on the change), the rest here.
 */
export const ZSetupForm = z.object({
  title: z.string().trim().max(200, "Keep the title under 200 characters."),
  hours: decimal("the hours to total over", 1, 100_000),
  options: z
    .array(
      z.object({
        name: z
          .string()
          .trim()
          .min(1, "Give the option a name the customer will recognise.")
          .max(120, "Keep the name under 120 characters."),
        oneOffCost: decimal("the one-off cost", 0, 100_000_000),
        changes: z.array(ZChangeFormValues).min(1, "Add at least one change.").max(10),
      }),
    )
    .min(1, "Add at least one option.")
    .max(4, "Compare at most four options at once."),
});
export type TSetupFormInput = z.input<typeof ZSetupForm>;
export type TSetupFormOutput = z.output<typeof ZSetupForm>;
