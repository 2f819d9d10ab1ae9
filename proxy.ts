// Runs before every page (not API routes: they answer 401 themselves, and a proxy would buffer
// large upload bodies). Two jobs: send signed-out visitors of signed-in pages to /sign-in, and
// give each page response a Content-Security-Policy with a fresh script nonce. The redirect is
// not authorization: every route handler, server action and page still checks the policy.
import { NextResponse, type NextFetchEvent, type NextRequest } from "next/server";
import { proxyAuth } from "@/features/auth/server/proxy-auth";
import { pageCsp } from "@/lib/platform/security-headers.mjs";

/**
 * Pages a signed-out visitor may open: home, sign-in, invitation, password reset, dev pages,
 * and the API reference (it describes the API, never anyone's data).
 */
const PUBLIC_PAGE =
  /^\/(?:$|sign-in(?:\/|$)|invite\/|reset-password(?:\/|$)|dev\/|developers(?:\/|$))/;

const withSession: unknown = proxyAuth((req) => {
  const { pathname } = req.nextUrl;
  if (!req.auth?.user && !PUBLIC_PAGE.test(pathname)) {
    const signIn = req.nextUrl.clone();
    signIn.pathname = "/sign-in";
    signIn.search = "";
    signIn.searchParams.set("callbackUrl", req.nextUrl.href);
    return NextResponse.redirect(signIn);
  }
  const nonce = btoa(crypto.randomUUID());
  const csp = pageCsp(nonce);
  // Next reads the nonce from the request's CSP header and stamps it on its inline scripts.
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("content-security-policy", csp);
  requestHeaders.set("x-nonce", nonce);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("Content-Security-Policy", csp);
  // Only the home page belongs in search indexes (robots.txt says the same to crawlers).
  if (pathname !== "/") res.headers.set("X-Robots-Tag", "noindex, nofollow");
  return res;
});

type TProxyHandler = (req: NextRequest, ev: NextFetchEvent) => Promise<Response | undefined>;

/**
 * Auth.js hands back the wrapped handler as a promise when its configuration is lazy (read per
 * request, so the build needs no secrets); Next needs a function here, so await it per call.
 */
export async function proxy(req: NextRequest, ev: NextFetchEvent) {
  const handler = (await withSession) as TProxyHandler;
  return handler(req, ev);
}

export const config = {
  // Every page; not API routes, Next's assets or files with an extension (public/). A new page
  // is covered without editing this list.
  matcher: ["/((?!api/|_next/|.*\\.\\w+$).*)"],
};
