// Security headers, public files and the dev mailbox's guard, over real HTTP against the
// production build (next.config headers and proxy.ts only run in a real server).
// Header meanings: CSP Level 3 (W3C), RFC 7034 (X-Frame-Options), Fetch standard
// (X-Content-Type-Options: nosniff), Referrer Policy (W3C), Permissions Policy (W3C).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import {
  baseUrl,
  cspViolationsSeenOnPurpose,
  launchBrowser,
  signIn,
} from "@/tests/support/browser";

function expectCommonHeaders(h: Headers) {
  expect(h.get("x-frame-options")).toBe("DENY");
  expect(h.get("x-content-type-options")).toBe("nosniff");
  expect(h.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
  expect(h.get("permissions-policy")).toMatch(/camera=\(\)/);
  expect(h.get("permissions-policy")).toMatch(/geolocation=\(\)/);
  expect(h.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
}

describe("security headers", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("a page carries a nonce CSP, a fresh nonce per request, stamped on every script", async () => {
    const first = await fetch(`${baseUrl}/sign-in`);
    const second = await fetch(`${baseUrl}/sign-in`);
    expect(first.status).toBe(200);
    expectCommonHeaders(first.headers);
    const csp = first.headers.get("content-security-policy") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(csp).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
    expect(csp).not.toMatch(/unsafe-eval/);
    expect(second.headers.get("content-security-policy")).not.toContain(nonce!);
    const html = await first.text();
    const scripts = html.match(/<script\b[^>]*>/g) ?? [];
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    expect(first.headers.get("x-robots-tag")).toMatch(/noindex/);
  });

  it("an API route carries them, with a CSP that allows nothing", async () => {
    const res = await fetch(`${baseUrl}/api/health`);
    expect(res.status).toBe(200);
    expectCommonHeaders(res.headers);
    expect(res.headers.get("content-security-policy")).toMatch(/^default-src 'none'/);
  });

  it("a file download carries them", async () => {
    const page = await browser.newPage();
    await signIn(page, "estimator@brackenridge.test");
    const list = await page.request.get(`${baseUrl}/api/v1/estimates?pageSize=1`);
    expect(list.status()).toBe(200);
    const [estimate] = (await list.json()).items as { id: string }[];
    expect(estimate).toBeDefined();
    const csv = await page.request.get(`${baseUrl}/api/v1/estimates/${estimate!.id}/csv`);
    expect(csv.status()).toBe(200);
    expect(csv.headers()["content-disposition"]).toMatch(/attachment/);
    expectCommonHeaders(new Headers(csv.headers()));
    await page.close();
  });

  it("signed-in pages render with no CSP violation in the browser console", async () => {
    // launchBrowser also fails the run on any violation; the injected script proves the console
    // shows one when the CSP blocks something.
    const page = await browser.newPage();
    const seen: string[] = [];
    page.on("console", (m) => seen.push(m.text()));
    await signIn(page, "estimator@brackenridge.test");
    for (const path of ["/dashboard", "/customers", "/machines", "/estimates", "/duty-cycles"]) {
      await page.goto(`${baseUrl}${path}`);
      await page.waitForLoadState("networkidle");
    }
    // Hydration ran (a client-side control responds), so the nonce let the scripts in.
    expect(await page.evaluate(() => typeof (window as { next?: unknown }).next === "object")).toBe(
      true,
    );
    expect(seen.filter((t) => /Content Security Policy/i.test(t))).toEqual([]);
    cspViolationsSeenOnPurpose(page);
    // Markup injected the way a stored-XSS payload would arrive: an inline event handler.
    // (A script element created from a trusted script is allowed by 'strict-dynamic' by design.)
    await page.evaluate(() => {
      const d = document.createElement("div");
      d.innerHTML = '<img src="/no-such-picture.png" onerror="window.__injected = 1">';
      document.body.append(d);
    });
    await page.waitForTimeout(500);
    expect(await page.evaluate(() => (window as { __injected?: number }).__injected)).toBe(
      undefined,
    );
    await expect.poll(() => seen.some((t) => /Content Security Policy/i.test(t))).toBe(true);
    await page.close();
  });
});

describe("public files", () => {
  it.each([
    ["/favicon.ico", /image\/(x-icon|vnd\.microsoft\.icon)/],
    ["/icon.svg", /image\/svg\+xml/],
    ["/apple-touch-icon.png", /image\/png/],
    ["/manifest.webmanifest", /manifest\+json|application\/json/],
  ])("%s is served", async (path, type) => {
    const res = await fetch(`${baseUrl}${path}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(type);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  });

  it("robots.txt keeps everything but the home page out of indexes", async () => {
    const res = await fetch(`${baseUrl}/robots.txt`);
    expect(res.status).toBe(200);
    const text = await res.text();
    expect(text).toMatch(/^Disallow: \/$/m);
    expect(text).toMatch(/^Allow: \/\$$/m);
  });

  it("the home page links the icons", async () => {
    const html = await (await fetch(baseUrl)).text();
    expect(html).toMatch(/<link rel="icon" href="\/favicon.ico"/);
    expect(html).toMatch(/<link rel="apple-touch-icon" href="\/apple-touch-icon.png"/);
  });
});

describe("development mailbox", () => {
  it("opens for a local request and is a 404 for a request from another machine", async () => {
    expect((await fetch(`${baseUrl}/dev/mailbox`)).status).toBe(200);
    // As a reverse proxy reports a remote client (documentation range, RFC 5737).
    const remote = await fetch(`${baseUrl}/dev/mailbox`, {
      headers: { "x-forwarded-for": "203.0.113.9" },
    });
    expect(remote.status).toBe(404);
  });
});
