import { z } from "zod";

/** What a form's server action returns: shown next to the form, never thrown. */
export type TActionState = {
  ok: boolean;
  code?:
    "unauthenticated" | "forbidden" | "not_found" | "invalid_input" | "conflict" | "rate_limited";
  message?: string;
  fieldErrors?: Record<string, string>;
};

export const SIGNED_OUT: TActionState = {
  ok: false,
  code: "unauthenticated",
  message: "Your session has ended. Sign in again.",
};

export const NOT_ALLOWED: TActionState = {
  ok: false,
  code: "forbidden",
  message: "Your role does not allow this.",
};

/** First message per field, from a zod error's flattened field errors. */
export function firstFieldErrors(
  fields: Record<string, string[] | undefined>,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, messages] of Object.entries(fields)) if (messages?.[0]) out[key] = messages[0];
  return out;
}

/** The answer to a form whose input failed its schema: one message per field. */
export function invalidInput(error: z.ZodError): TActionState {
  return {
    ok: false,
    code: "invalid_input",
    message: "Check the highlighted fields.",
    fieldErrors: firstFieldErrors(z.flattenError(error).fieldErrors as Record<string, string[]>),
  };
}
