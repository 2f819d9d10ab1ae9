import { BillingProviderError } from "@/features/billing/server/stripe";

/** What a billing verb answers: never thrown at the page, always words for the admin. */
export type TBillingResult<T = undefined> =
  | ({ ok: true } & (T extends undefined ? object : { value: T }))
  | { ok: false; code: string; message: string };

export const NOT_BILLING_ADMIN = {
  ok: false as const,
  code: "forbidden",
  message: "Only a billing admin or a dealer admin can change the report plan.",
};

/** Runs a provider-backed step; provider failures become a clear, non-throwing answer. */
export async function withProviderErrors<T = undefined>(
  run: () => Promise<TBillingResult<T>>,
): Promise<TBillingResult<T>> {
  try {
    return await run();
  } catch (error) {
    if (error instanceof BillingProviderError)
      return { ok: false, code: error.code, message: error.message };
    throw error;
  }
}
