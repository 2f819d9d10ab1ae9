/**
 * Where to go after signing in: a path on this site. An absolute URL (the proxy sends one) is
 * reduced to its path, so a crafted link can never send someone to another origin.
 */
export function safeCallbackPath(raw: unknown, fallback = "/dashboard"): string {
  if (typeof raw !== "string" || raw.length === 0 || raw.length > 2000) return fallback;
  let path = raw;
  if (/^https?:\/\//i.test(raw)) {
    try {
      const url = new URL(raw);
      path = `${url.pathname}${url.search}`;
    } catch {
      return fallback;
    }
  }
  if (!path.startsWith("/") || path.startsWith("//") || path.includes("\\")) return fallback;
  if (path.startsWith("/sign-in") || path.startsWith("/api/auth")) return fallback;
  return path;
}
