import type { z } from "zod";

/** A refusal a route handler answers as JSON `{ error: { code, message, fieldErrors?, ...detail } }`. */
export class CalibrationError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
    readonly detail?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "CalibrationError";
  }
}

export const notFound = (what: string) =>
  new CalibrationError(404, "not_found", `No ${what} with that id in your workspace.`);

export const forbidden = (what: string) =>
  new CalibrationError(403, "forbidden", `Your role may not see or change ${what}.`);

/** Parses with a schema or throws a 400 listing every field to fix. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) {
    (fieldErrors[issue.path.map(String).join(".") || "_"] ??= []).push(issue.message);
  }
  const [key, messages] = Object.entries(fieldErrors)[0] ?? ["_", ["Invalid input."]];
  throw new CalibrationError(
    400,
    "invalid_input",
    `Please fix the input. ${key !== "_" ? `${key}: ` : ""}${messages[0]}`,
    fieldErrors,
  );
}
