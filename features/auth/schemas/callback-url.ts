/** Where to go after signing in: only paths on this site, never another origin. */
export function safeCallbackPath(raw: unknown, fallback = "/dashboard"): string {
  if (typeof raw !== "string" || !raw.startsWith("/") || raw.startsWith("//")) return fallback;
  if (raw.startsWith("/sign-in") || raw.startsWith("/api/auth")) return fallback;
  return raw;
}
