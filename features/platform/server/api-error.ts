import type { z } from "zod";

export type TFieldErrors = Record<string, string[]>;

/** A refusal a route handler turns into a JSON error; `status` is the HTTP status. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors?: TFieldErrors,
    readonly detail?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export const forbidden = (what: string) =>
  new ApiError(403, "forbidden", `Your role may not change ${what}.`);

export const notFound = (what: string) =>
  new ApiError(404, "not_found", `No ${what} with that id in your workspace.`);

/** Field-level messages keyed by dotted path ("spec.axles.front.track"), for forms and API clients. */
export function fieldErrorsOf(error: z.ZodError, prefix = ""): TFieldErrors {
  const out: TFieldErrors = {};
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join(".") || "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function invalidInput(error: z.ZodError, prefix = ""): ApiError {
  const fieldErrors = fieldErrorsOf(error, prefix);
  const first = Object.entries(fieldErrors)[0];
  const where = first && first[0] !== "_" ? `${first[0]}: ` : "";
  return new ApiError(
    400,
    "invalid_input",
    `Please fix the input. ${where}${first?.[1][0] ?? "Invalid input."}`,
    fieldErrors,
  );
}

/** A body field that names a record the actor cannot use: a 400 on that field. */
export function invalidReference(field: string, message: string): ApiError {
  return new ApiError(400, "invalid_input", `Please fix the input. ${field}: ${message}`, {
    [field]: [message],
  });
}

/** Parses with a schema or throws a 400 listing every field to fix. */
export function parseOrThrow<S extends z.ZodType>(
  schema: S,
  value: unknown,
  prefix = "",
): z.output<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw invalidInput(parsed.error, prefix);
  return parsed.data;
}
