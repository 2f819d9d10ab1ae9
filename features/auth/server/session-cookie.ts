import "server-only";
import { decode, encode } from "next-auth/jwt";
import { getEnv } from "@/lib/env";

/** Cookie names Auth.js uses for the JWT session, over http and https. */
export const SESSION_COOKIE_NAMES = [
  "authjs.session-token",
  "__Secure-authjs.session-token",
] as const;

/** How long a session lasts without activity; Auth.js refreshes it while in use. */
export const SESSION_MAX_AGE_SECONDS = 8 * 60 * 60;

export type TSessionClaims = { userId: string; issuedAt: number | null };

/** Parses a Cookie header into name → value. */
export function parseCookieHeader(header: string | null): Map<string, string> {
  const out = new Map<string, string>();
  if (!header) return out;
  for (const part of header.split(";")) {
    const eq = part.indexOf("=");
    if (eq < 0) continue;
    const name = part.slice(0, eq).trim();
    const raw = part.slice(eq + 1).trim();
    try {
      out.set(name, decodeURIComponent(raw));
    } catch {
      out.set(name, raw);
    }
  }
  return out;
}

/** Auth.js splits a large token across `name.0`, `name.1`...; join them back. */
function readChunked(cookies: Map<string, string>, name: string): string | null {
  const whole = cookies.get(name);
  if (whole) return whole;
  const parts: string[] = [];
  for (let i = 0; cookies.has(`${name}.${i}`); i++) parts.push(cookies.get(`${name}.${i}`) ?? "");
  return parts.length ? parts.join("") : null;
}

/** Decodes the session cookie (either name) into the user id it was issued for. */
export async function readSessionClaims(
  cookies: Map<string, string>,
): Promise<TSessionClaims | null> {
  const secret = getEnv().AUTH_SECRET;
  for (const name of SESSION_COOKIE_NAMES) {
    const token = readChunked(cookies, name);
    if (!token) continue;
    try {
      const payload = await decode({ token, secret, salt: name });
      const userId = typeof payload?.sub === "string" ? payload.sub : null;
      if (userId)
        return { userId, issuedAt: typeof payload?.iat === "number" ? payload.iat : null };
    } catch {
      // Tampered, expired or signed with another secret: treat as signed out.
    }
  }
  return null;
}

/** Mints a session token the way Auth.js does (used by the test helpers and nothing else). */
export async function mintSessionToken(opts: {
  userId: string;
  email: string;
  cookieName?: (typeof SESSION_COOKIE_NAMES)[number];
}): Promise<{ name: string; value: string }> {
  const name = opts.cookieName ?? SESSION_COOKIE_NAMES[0];
  const value = await encode({
    token: { sub: opts.userId, email: opts.email },
    secret: getEnv().AUTH_SECRET,
    salt: name,
    maxAge: SESSION_MAX_AGE_SECONDS,
  });
  return { name, value };
}
