import "server-only";
import type { DbOrTx } from "@/db/client";
import { getEnv } from "@/lib/env";
import { hitRateLimit } from "@/features/auth/server/rate-limit";

const WINDOW_SECONDS = 15 * 60;

/** The client address as the proxy in front of the app reports it; "unknown" without one. */
export function clientIp(headers: Headers | undefined | null): string {
  const forwarded = headers?.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || headers?.get("x-real-ip")?.trim() || "unknown";
}

/**
 * Counts one sign-in or magic-link attempt against the address and the client IP. Counts are
 * kept whether or not the address has an account, so the limit reveals nothing.
 */
export async function checkSignInLimits(
  db: DbOrTx,
  opts: { kind: "password" | "magic-link" | "password-reset"; email: string; ip: string },
): Promise<{ allowed: boolean; retryAfterSeconds: number }> {
  const env = getEnv();
  const email = opts.email.trim().toLowerCase();
  const [byAddress, byIp] = await Promise.all([
    hitRateLimit(db, {
      key: `${opts.kind}:address:${email}`,
      limit: env.AUTH_LIMIT_PER_ADDRESS,
      windowSeconds: WINDOW_SECONDS,
    }),
    hitRateLimit(db, {
      key: `${opts.kind}:ip:${opts.ip}`,
      limit: env.AUTH_LIMIT_PER_IP,
      windowSeconds: WINDOW_SECONDS,
    }),
  ]);
  return {
    allowed: byAddress.allowed && byIp.allowed,
    retryAfterSeconds: Math.max(byAddress.retryAfterSeconds, byIp.retryAfterSeconds),
  };
}
