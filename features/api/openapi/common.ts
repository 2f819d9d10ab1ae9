import { extendZodWithOpenApi, type OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";

extendZodWithOpenApi(z);

export { z };

/** The one error shape every route answers with (features/platform respond, app/api/_lib/errors). */
export const ZApiError = z
  .object({
    error: z
      .object({
        code: z.string().openapi({ example: "invalid_input" }),
        message: z
          .string()
          .openapi({ example: "Please fix the input. name: Give the customer a name." }),
        fieldErrors: z
          .record(z.string(), z.union([z.array(z.string()), z.string()]))
          .optional()
          .openapi({ example: { name: ["Give the customer a name."] } }),
      })
      .loose(),
  })
  .openapi("Error", {
    description:
      "Every refusal: `code` is stable for programs, `message` says what to fix, `fieldErrors` names each field (dotted paths).",
  });

const errorContent = { "application/json": { schema: ZApiError } };

/** The answers every authenticated route may give besides its own. */
export const COMMON_ERRORS = {
  401: {
    description:
      "No session and no valid token; or the token was revoked, expired, or its maker left the dealership.",
    content: errorContent,
  },
  403: { description: "Your role or the token's scopes do not allow this.", content: errorContent },
  429: {
    description: "The token went over its requests per minute; wait `Retry-After` seconds.",
    headers: { "Retry-After": { schema: { type: "integer" as const } } },
    content: errorContent,
  },
} as const;

export const INPUT_ERRORS = {
  400: {
    description: "The input is invalid: `fieldErrors` says what to fix.",
    content: errorContent,
  },
} as const;

export const NOT_FOUND = {
  404: {
    description: "No such record in your dealership (another dealership's records answer 404 too).",
    content: errorContent,
  },
} as const;

/** A DELETE without `confirm=true` (some routes say what would go with a 409 instead). */
export const CONFIRM = {
  400: {
    description: "Not confirmed: send `confirm=true` to delete.",
    content: errorContent,
  },
} as const;

export const CONFLICT = {
  409: {
    description: "The record changed or is in use; the message says why.",
    content: errorContent,
  },
} as const;

export const IDEMPOTENCY = {
  409: {
    description:
      "A request with this Idempotency-Key is still running, or the record is in conflict.",
    content: errorContent,
  },
  422: {
    description: "This Idempotency-Key was already used for a different request.",
    content: errorContent,
  },
} as const;

export const ZIdempotencyHeaders = z.object({
  "Idempotency-Key": z.string().max(255).optional().openapi({
    description:
      "Any unique string (a UUID is ideal). A repeat with the same key within 24 h returns the first successful answer instead of creating again.",
    example: "7b6c1f0e-2d1a-4a57-9d53-0d7e5b0f5a11",
  }),
});

export const ZId = z.uuid().openapi({ example: "3f0c8a52-6a7e-4c1d-9b1e-2f4a9d6c0e11" });
export const ZIdParams = z.object({ id: ZId });
export const ZTimestamp = z
  .string()
  .openapi({ format: "date-time", example: "2026-11-18T09:30:00.000Z" });

export const ZDeleteQuery = z.object({
  confirm: z.enum(["true"]).optional().openapi({
    description:
      "Without `confirm=true` nothing is deleted: the answer (400 or 409) says what would go.",
  }),
});

export const ZDeleted = z
  .object({ deleted: z.literal(true), impact: z.record(z.string(), z.number()).optional() })
  .loose()
  .openapi("Deleted");

/** One page of a list, the shape every list answers. */
export function page<T extends z.ZodType>(item: T, name: string) {
  return z
    .object({
      items: z.array(item),
      page: z.number().int(),
      pageSize: z.number().int(),
      total: z.number().int(),
      pageCount: z.number().int(),
    })
    .openapi(name);
}

export function json<T extends z.ZodType>(schema: T, description: string) {
  return { description, content: { "application/json": { schema } } };
}

export function file(mime: string, description: string) {
  return {
    description,
    content: { [mime]: { schema: z.string().openapi({ format: "binary" }) } },
  };
}

export type TRegister = (registry: OpenAPIRegistry) => void;
