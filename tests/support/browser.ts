import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";

/**
 * Debian's Chromium, driven by playwright-core. Never downloads a browser. Every page it opens
 * is watched for Content-Security-Policy violations, and closing the browser fails the test file
 * if there were any, so every journey also proves the CSP lets the app run.
 */
export async function launchBrowser(): Promise<Browser> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  const violations: string[] = [];
  const watch = (page: Page) =>
    page.on("console", (m) => {
      if (/Content Security Policy/i.test(m.text()) && !exempt.has(page))
        violations.push(`${page.url()}: ${m.text()}`);
    });
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (...args: Parameters<Browser["newContext"]>) => {
    const context: BrowserContext = await newContext(...args);
    context.on("page", watch);
    return context;
  };
  const newPage = browser.newPage.bind(browser);
  browser.newPage = async (...args: Parameters<Browser["newPage"]>) => {
    const page = await newPage(...args);
    watch(page);
    return page;
  };
  const close = browser.close.bind(browser);
  browser.close = async (...args: Parameters<Browser["close"]>) => {
    await close(...args);
    if (violations.length)
      throw new Error(`Content-Security-Policy violations:\n${violations.join("\n")}`);
  };
  return browser;
}

const exempt = new WeakSet<Page>();

/** For a test that provokes a violation on purpose: that page's violations are not failures. */
export function cspViolationsSeenOnPurpose(page: Page) {
  exempt.add(page);
}

export const baseUrl = `http://localhost:${process.env.E2E_PORT ?? "3100"}`;

/** Signs in through the sign-in form, as a person would, and waits to leave the sign-in page. */
export async function signIn(page: Page, email: string, password: string = DEMO_PASSWORD) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail address").first().fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}
