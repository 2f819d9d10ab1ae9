import { z } from "zod";
import { isSupportedCurrency } from "@/lib/format/format";

/** A dealership's currency: an ISO 4217 code that this runtime's Intl can format. */
export const ZDealershipCurrency = z.object({
  currency: z
    .string()
    .trim()
    .transform((s) => s.toUpperCase())
    .refine(isSupportedCurrency, {
      message: "Choose a currency by its three-letter ISO 4217 code, e.g. GBP, EUR or USD.",
    }),
});

export type TDealershipCurrency = z.infer<typeof ZDealershipCurrency>;
