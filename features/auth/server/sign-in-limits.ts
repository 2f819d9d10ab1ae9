import "server-only";
import type { DbOrTx } from "@/db/client";
import { getEnv } from "@/lib/env";
import { hitRateLimit, isRateLimited } from "@/features/auth/server/rate-limit";

const WINDOW_SECONDS = 15 * 60;

/** The client address as the proxy in front of the app reports it; "unknown" without one. */
export function clientIp(headers: Headers | undefined | null): string {
  const forwarded = headers?.get("x-forwarded-for")?.split(",")[0]?.trim();
  return forwarded || headers?.get("x-real-ip")?.trim() || "unknown";
}

type TKind = "password" | "magic-link" | "password-reset";

function keys(kind: TKind, email: string, ip: string) {
  const env = getEnv();
  return [
    { key: `${kind}:address:${email.trim().toLowerCase()}`, limit: env.AUTH_LIMIT_PER_ADDRESS },
    { key: `${kind}:ip:${ip}`, limit: env.AUTH_LIMIT_PER_IP },
  ].map((k) => ({ ...k, windowSeconds: WINDOW_SECONDS }));
}

/**
 * Counts one e-mail link or reset request against the address and the client IP (each one
 * sends mail). Counts are kept whether or not the address has an account, so the limit
 * reveals nothing.
 */
export async function checkSignInLimits(
  db: DbOrTx,
  opts: { kind: Exclude<TKind, "password">; email: string; ip: string },
): Promise<{ allowed: boolean }> {
  const results = await Promise.all(
    keys(opts.kind, opts.email, opts.ip).map((k) => hitRateLimit(db, k)),
  );
  return { allowed: results.every((r) => r.allowed) };
}

/**
 * Password sign-in: only failures count, so people who sign in often are never locked out;
 * once an address or IP has used up its failures, even the right password waits.
 */
export async function isPasswordSignInBlocked(
  db: DbOrTx,
  opts: { email: string; ip: string },
): Promise<boolean> {
  const limited = await Promise.all(
    keys("password", opts.email, opts.ip).map((k) => isRateLimited(db, k)),
  );
  return limited.some(Boolean);
}

export async function countFailedPasswordSignIn(
  db: DbOrTx,
  opts: { email: string; ip: string },
): Promise<void> {
  await Promise.all(keys("password", opts.email, opts.ip).map((k) => hitRateLimit(db, k)));
}
