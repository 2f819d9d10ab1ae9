import type { z } from "zod";

/** A refusal a route handler answers as JSON `{ error: { code, message, fieldErrors? } }`. */
export class OptionsError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
    this.name = "OptionsError";
  }
}

export const notFound = (what: string) =>
  new OptionsError(404, "not_found", `No ${what} with that id in your workspace.`);

/** Parses with a schema or throws a 400 that lists every field to fix. */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path.map(String).join(".") || "_";
    (fieldErrors[key] ??= []).push(issue.message);
  }
  const [first] = Object.entries(fieldErrors);
  throw new OptionsError(
    400,
    "invalid_input",
    `Please fix the input. ${first ? `${first[0]}: ${first[1][0]}` : ""}`.trim(),
    fieldErrors,
  );
}
