import { chromium, type Browser, type Page } from "playwright-core";
import { DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";

/** Debian's Chromium, driven by playwright-core. Never downloads a browser. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
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
