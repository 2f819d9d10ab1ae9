import { chromium, type Browser } from "playwright-core";

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
