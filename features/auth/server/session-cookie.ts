import "server-only";
import { hkdfSync } from "node:crypto";
import { base64url, calculateJwkThumbprint, jwtDecrypt } from "jose";
import { encode } from "next-auth/jwt";
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

type TDerivedKey = { key: Uint8Array; kid: string };
const derivedKeys = new Map<string, Promise<TDerivedKey>>();

/**
 * The key Auth.js derives from the secret and cookie name (HKDF-SHA256, same info string and
 * lengths as @auth/core's jwt module), with its JWK thumbprint. Deriving it costs more than the
 * decryption itself, and it depends only on secret, salt and algorithm, so it is kept per process.
 */
function derivedKey(enc: string, secret: string, salt: string): Promise<TDerivedKey> {
  const id = `${enc}\u0000${salt}\u0000${secret}`;
  let found = derivedKeys.get(id);
  if (!found) {
    const length = enc === "A256CBC-HS512" ? 64 : enc === "A256GCM" ? 32 : 0;
    if (!length) return Promise.reject(new Error(`unsupported content encryption ${enc}`));
    const info = `Auth.js Generated Encryption Key (${salt})`;
    const key = new Uint8Array(hkdfSync("sha256", secret, salt, info, length));
    found = calculateJwkThumbprint(
      { kty: "oct", k: base64url.encode(key) },
      `sha${key.byteLength << 3}` as "sha256" | "sha384" | "sha512",
    ).then((kid) => ({ key, kid }));
    derivedKeys.set(id, found);
  }
  return found;
}

/** Auth.js's `decode` with the derived key cached; same algorithms, kid check and clock tolerance. */
async function decodeSessionToken(token: string, secret: string, salt: string) {
  const { payload } = await jwtDecrypt(
    token,
    async ({ kid, enc }) => {
      const derived = await derivedKey(enc, secret, salt);
      if (kid !== undefined && kid !== derived.kid) throw new Error("no matching secret");
      return derived.key;
    },
    {
      clockTolerance: 15,
      keyManagementAlgorithms: ["dir"],
      contentEncryptionAlgorithms: ["A256CBC-HS512", "A256GCM"],
    },
  );
  return payload;
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
      const payload = await decodeSessionToken(token, secret, name);
      const userId = typeof payload.sub === "string" ? payload.sub : null;
      if (userId) return { userId, issuedAt: typeof payload.iat === "number" ? payload.iat : null };
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
