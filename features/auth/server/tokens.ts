import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A random URL-safe token (256 bits) and the SHA-256 hash that is stored instead of it. */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
