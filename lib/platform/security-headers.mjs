// Security headers, in one place for next.config.mjs (every response) and proxy.ts (the page
// CSP with its per-request nonce). Plain ESM so the Next config can import it without a build.

/** Sent with every response: pages, API routes, file downloads and public/ files. */
export const SECURITY_HEADERS = [
  // Legacy twin of CSP frame-ancestors for browsers that ignore CSP (RFC 7034).
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  {
    key: "Permissions-Policy",
    value:
      "camera=(), microphone=(), geolocation=(), payment=(), usb=(), serial=(), interest-cohort=()",
  },
];

/** API routes and downloads render nothing, so they may load nothing and never be framed. */
export const API_CSP =
  "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * The page CSP. Scripts run only with this request's nonce (Next adds it to its own inline
 * scripts when it finds it in the request's CSP header); 'strict-dynamic' lets those scripts load
 * the app's chunks. Inline style attributes stay allowed: React and the chart library set them.
 */
export function pageCsp(nonce) {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}
