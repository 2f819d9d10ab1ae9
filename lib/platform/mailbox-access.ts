/**
 * Whether the development mailbox (captured sign-in and reset links) may be shown. It holds live
 * sign-in links, so all of these must hold: MAILBOX_ENABLED is on; the app is not deployed (its
 * public URL is a loopback address, as `npm start` and the test tier set it; a deployed
 * production app has a real host name); and the request itself came from this machine (every
 * hop in X-Forwarded-For, which Next fills from the socket, and the Host header are loopback).
 */
export function mailboxAllowed({
  enabled,
  appUrl,
  host,
  forwardedFor,
}: {
  enabled: boolean;
  appUrl: string;
  host: string | null;
  forwardedFor: string | null;
}): boolean {
  if (!enabled) return false;
  if (!isLoopbackHost(new URL(appUrl).hostname)) return false;
  if (!host || !isLoopbackHost(hostWithoutPort(host))) return false;
  // Next sets X-Forwarded-For to the peer's address when no proxy did; no header means we
  // cannot tell where the request came from, so refuse.
  const hops = (forwardedFor ?? "")
    .split(",")
    .map((h) => h.trim())
    .filter(Boolean);
  return hops.length > 0 && hops.every(isLoopbackAddress);
}

function hostWithoutPort(host: string): string {
  const h = host.trim().toLowerCase();
  if (h.startsWith("[")) return h.slice(0, h.indexOf("]") + 1);
  return h.replace(/:\d+$/, "");
}

function isLoopbackHost(hostname: string): boolean {
  const h = hostname.toLowerCase();
  return h === "localhost" || isLoopbackAddress(h.replace(/^\[|\]$/g, ""));
}

function isLoopbackAddress(address: string): boolean {
  const a = address.toLowerCase().replace(/^\[|\]$/g, "");
  if (a === "::1") return true;
  const v4 = a.startsWith("::ffff:") ? a.slice(7) : a;
  // 127.0.0.0/8 is loopback (RFC 1122 §3.2.1.3; ::1 is RFC 4291 §2.5.3).
  return /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(v4);
}
