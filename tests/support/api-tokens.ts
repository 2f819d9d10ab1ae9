import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { TActor } from "@/lib/authz/actor";
import type { TApiScope } from "@/lib/authz/api-scopes";
import { createApiToken } from "@/features/api/server/create-api-token";

/**
 * Makes an API token the way a dealer admin does (the real verb) and returns its secret;
 * `expired`/`revoked` then age or revoke it in the database.
 */
export async function makeApiToken(
  db: Db,
  admin: TActor,
  scopes: TApiScope[],
  opts: { requestsPerMinute?: number; expired?: boolean; revoked?: boolean; name?: string } = {},
): Promise<{ id: string; secret: string; authorization: string }> {
  const made = await createApiToken({
    db,
    actor: admin,
    input: {
      name: opts.name ?? `Test ${scopes.join("+")} token`,
      scopes,
      requestsPerMinute: opts.requestsPerMinute ?? 600,
    },
  });
  if (opts.expired)
    await db
      .update(apiTokens)
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where(eq(apiTokens.id, made.id));
  if (opts.revoked)
    await db.update(apiTokens).set({ revokedAt: new Date() }).where(eq(apiTokens.id, made.id));
  return { id: made.id, secret: made.secret, authorization: `Bearer ${made.secret}` };
}
