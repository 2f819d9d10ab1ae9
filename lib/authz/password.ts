import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from "node:crypto";

// scrypt (RFC 7914) with one of the equal-strength minimums in OWASP's Password Storage Cheat
// Sheet: N=2^15, r=8, p=3 (32 MiB per hash). Parameters are stored with each hash so they can
// be raised later without breaking existing passwords.
const PARAMS = { N: 2 ** 15, r: 8, p: 3 } as const;
const KEY_LENGTH = 64;

function derive(password: string, salt: Buffer, p: { N: number; r: number; p: number }) {
  const options: ScryptOptions = { N: p.N, r: p.r, p: p.p, maxmem: 256 * p.N * p.r };
  return new Promise<Buffer>((resolve, reject) =>
    scrypt(password.normalize("NFKC"), salt, KEY_LENGTH, options, (err, key) =>
      err ? reject(err) : resolve(key),
    ),
  );
}

/** Hashes a password with a fresh 16-byte salt: `scrypt$N$r$p$salt$hash` (base64url). */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(16);
  const key = await derive(password, salt, PARAMS);
  return [
    "scrypt",
    PARAMS.N,
    PARAMS.r,
    PARAMS.p,
    salt.toString("base64url"),
    key.toString("base64url"),
  ].join("$");
}

/** Checks a password against a stored hash in constant time; false for any malformed hash. */
export async function verifyPassword(password: string, stored: string | null): Promise<boolean> {
  const parts = (stored ?? "").split("$");
  if (parts.length !== 6 || parts[0] !== "scrypt") {
    // Spend the same effort as a real check so timing does not tell whether an account exists.
    await derive(password, randomBytes(16), PARAMS);
    return false;
  }
  const [, n, r, p, saltText, keyText] = parts as [string, string, string, string, string, string];
  const expected = Buffer.from(keyText, "base64url");
  const key = await derive(password, Buffer.from(saltText, "base64url"), {
    N: Number(n),
    r: Number(r),
    p: Number(p),
  });
  return key.length === expected.length && timingSafeEqual(key, expected);
}
