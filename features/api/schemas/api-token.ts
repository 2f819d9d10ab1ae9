import { z } from "zod";
import { API_SCOPES } from "@/lib/authz/api-scopes";

export const ZApiScope = z.enum(API_SCOPES);

/** A dealer admin's new token: a name to recognise it, what it may do, and when it stops. */
export const ZCreateApiTokenInput = z.object({
  name: z
    .string()
    .trim()
    .min(1, "Give the token a name, e.g. the system that will use it.")
    .max(80, "Keep the name under 80 characters."),
  scopes: z
    .array(ZApiScope, { error: "Choose what the token may do." })
    .min(1, "Choose at least one scope."),
  /** Days until the token stops working; empty for a token that does not expire. */
  expiresInDays: z.coerce
    .number()
    .int("Whole days only.")
    .min(1, "At least 1 day.")
    .max(730, "At most 730 days (two years).")
    .optional(),
  requestsPerMinute: z.coerce
    .number()
    .int("Whole requests only.")
    .min(1, "At least 1 request per minute.")
    .max(6000, "At most 6000 requests per minute.")
    .default(600),
});
export type TCreateApiTokenInput = z.infer<typeof ZCreateApiTokenInput>;

/** A token as lists show it: never the secret, only its first characters. */
export type TApiTokenDto = {
  id: string;
  name: string;
  scopes: string[];
  prefix: string;
  requestsPerMinute: number;
  expiresAt: string | null;
  lastUsedAt: string | null;
  revokedAt: string | null;
  createdAt: string;
  createdBy: string | null;
};
