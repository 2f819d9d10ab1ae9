import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** Every secret starts with this, so a leaked one is easy to recognise in logs and scanners. */
export const TOKEN_PREFIX = "tcapi_";

/** 32 random bytes (256 bits): too many to guess, so a plain SHA-256 is enough to store. */
export function newTokenSecret(): string {
  return `${TOKEN_PREFIX}${randomBytes(32).toString("base64url")}`;
}

export function hashTokenSecret(secret: string): string {
  return createHash("sha256").update(secret, "utf8").digest("hex");
}

/** What a list shows: enough to tell tokens apart, far too little to use. */
export function visiblePrefix(secret: string): string {
  return secret.slice(0, TOKEN_PREFIX.length + 6);
}
