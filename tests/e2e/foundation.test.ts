import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { baseUrl, launchBrowser } from "@/tests/support/browser";

describe("foundation journeys", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("home page renders with the product name", async () => {
    const page = await browser.newPage();
    await page.goto(baseUrl);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain(
      "Treadcast",
    );
    await expect(page.title()).resolves.toContain("Treadcast");
    await page.close();
  });

  it("health reports the database up", async () => {
    const res = await fetch(`${baseUrl}/api/health`);
    expect(res.status).toBe(200);
    const body = (await res.json()) as { database: string; version: string };
    expect(body.database).toBe("up");
    expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
  });

  it("the home page fits a phone screen without sideways scrolling", async () => {
    const page = await browser.newPage({ viewport: { width: 375, height: 740 } });
    await page.goto(baseUrl);
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    await page.close();
  });
});
