import type { z } from "zod";
import { quantityOf } from "@/features/machines/lib/machine-units";
import { fromSi, unitLabel, type TUnitSystem } from "@/lib/format/units";

type TIssue = z.core.$ZodIssue;

const show = (v: number) => v.toLocaleString("en-GB", { maximumFractionDigits: 2 });

/**
 * A message in the user's own units: the engine's limits are in SI, so "at most 15" on the
 * wheelbase reads "at most 590.55 in" to an imperial user.
 */
export function friendlyMessage(issue: TIssue, system: TUnitSystem, fieldPath: string): string {
  const specPath = fieldPath.replace(/^spec\./, "");
  const quantity = quantityOf(specPath);
  const unit = unitLabel(system, quantity);
  const withUnit = (si: number) => `${show(fromSi(system, quantity, si))}${unit ? ` ${unit}` : ""}`;
  switch (issue.code) {
    case "invalid_type":
      return issue.input === undefined ||
        (typeof issue.input === "number" && Number.isNaN(issue.input))
        ? "Required: enter a value."
        : issue.message;
    case "too_small": {
      const min = Number(issue.minimum);
      if (issue.origin === "string")
        return min <= 1 ? "Required: enter a value." : `At least ${min} characters.`;
      if (issue.origin !== "number") return issue.message;
      if (min === 0 && !issue.inclusive) return "Must be more than 0.";
      return `Must be ${issue.inclusive ? "at least" : "more than"} ${withUnit(min)}.`;
    }
    case "too_big": {
      const max = Number(issue.maximum);
      if (issue.origin === "string") return `At most ${max} characters.`;
      if (issue.origin !== "number") return issue.message;
      return `Must be ${issue.inclusive ? "at most" : "less than"} ${withUnit(max)}.`;
    }
    default:
      return issue.message;
  }
}

export type TNestedErrors = { [key: string]: TNestedErrors | { type: string; message: string } };

/** Zod issues as the nested error object react-hook-form expects, first message per field. */
export function toNestedErrors(
  error: z.ZodError,
  system: TUnitSystem,
  prefix: string[] = [],
): TNestedErrors {
  const out: TNestedErrors = {};
  for (const issue of error.issues) {
    const path = [...prefix, ...issue.path.map(String)];
    if (path.length === 0) path.push("root");
    let node = out as Record<string, unknown>;
    for (const key of path.slice(0, -1)) {
      const next = node[key];
      if (!next || typeof next !== "object" || "message" in (next as object)) node[key] = {};
      node = node[key] as Record<string, unknown>;
    }
    const last = path[path.length - 1]!;
    if (!node[last])
      node[last] = { type: issue.code, message: friendlyMessage(issue, system, path.join(".")) };
  }
  return out;
}
