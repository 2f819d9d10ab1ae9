import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";
import { KNOWN_TURNS, knownTelematicsCsv } from "@/tests/integration/duty-cycles/support";

// The demo estimator uploads a small telematics log, maps its columns over the preview, and
// watches it processed by the background worker and summarised. Invented data.

describe("duty-cycle upload journey", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("uploads a log, maps the columns, and shows it processed and summarised", async () => {
    const page = await browser.newPage();
    await signIn(page, "estimator@brackenridge.test");
    await page.goto(`${baseUrl}/duty-cycles`);
    await page.getByRole("link", { name: "Upload a CSV" }).click();
    await page.waitForURL(/\/duty-cycles\/upload$/);

    const { csv, rows } = knownTelematicsCsv(["oops,10,0,field"]);
    await page.getByLabel("CSV file").setInputFiles({
      name: "drilling-log.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(csv),
    });
    // The upload runs while the columns are mapped: its bar reaches 100 %.
    await page.getByRole("progressbar", { name: "Uploaded" }).waitFor({ timeout: 15_000 });

    // The preview guessed the columns from the header row; check and set them as a dealer would.
    await expect(page.getByLabel("What the file holds").inputValue()).resolves.toBe("telematics");
    await page.getByLabel("Time column").selectOption({ label: "1: time_s" });
    await page.getByLabel("Time unit").selectOption("s");
    await page.getByLabel("Ground speed column").selectOption({ label: "2: speed_kmh" });
    await page.getByLabel("Ground speed unit").selectOption("km/h");
    await page.getByLabel("Yaw rate column").selectOption({ label: "3: yaw_dps" });
    await page.getByLabel("Surface column").selectOption({ label: "4: ground" });
    await expect(page.getByText("The mapping is not complete yet").count()).resolves.toBe(0);

    // Save the mapping for the next file from this logger; it is listed for the dealership.
    const templateName = `Drill logger ${uniqueTag()}`;
    await page.getByLabel("Save this mapping as a template").fill(templateName);
    await page.getByRole("button", { name: "Save template" }).click();
    await page
      .locator("section", { hasText: "Saved column mappings" })
      .getByText(templateName)
      .waitFor();

    const name = `Drilling log ${uniqueTag()}`;
    await page.getByLabel("Duty cycle name").fill(name);
    await page.getByLabel("Customer", { exact: true }).selectOption({ label: "Hollin Vale Farm" });
    await page.getByRole("button", { name: "Import" }).click();
    await page.waitForURL(/\/duty-cycles\/[0-9a-f-]{36}$/, { timeout: 30_000 });

    // Processed in the background; the page follows the job and then shows the summary.
    await page.getByRole("heading", { name: "Summary" }).waitFor({ timeout: 30_000 });
    await page.getByRole("heading", { name: name }).waitFor();
    await page.getByText(`Turns (${KNOWN_TURNS})`).waitFor();
    await page.getByText("1 row was skipped").waitFor();
    await expect(
      page.getByText(`${rows.toLocaleString("en-GB")} rows were used`).count(),
    ).resolves.toBe(1);
    for (const chart of [
      "Turns per hour by radius",
      "Turns per hour by surface",
      "Share of moving time by speed (km/h)",
    ])
      await expect(page.locator("figcaption", { hasText: chart }).count()).resolves.toBe(1);
    // The charts are drawn (visx bars inside svg).
    await expect(page.locator("figure svg rect").count()).resolves.toBeGreaterThan(3);

    // The list shows it ready.
    await page.goto(`${baseUrl}/duty-cycles`);
    const row = page.getByRole("row", { name: new RegExp(name) });
    await expect(row.getByText("ready").count()).resolves.toBe(1);
    await page.close();
  });

  it("builds a yard loader's duty cycle without a file", async () => {
    const page = await browser.newPage();
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(e.message));
    await signIn(page, "estimator@brackenridge.test");
    await page.goto(`${baseUrl}/duty-cycles/build`);
    await page.getByLabel("Example").selectOption({ label: "Yard loader, 40 cycles per hour" });
    // Four turns a cycle at 40 cycles an hour: 160 turns per hour in the live preview.
    await page.getByText("160.0").first().waitFor();
    const name = `Clamp loading ${uniqueTag()}`;
    await page.getByLabel("Duty cycle name").fill(name);
    await page.getByLabel("Customer", { exact: true }).selectOption({ label: "Hollin Vale Farm" });
    await page.getByRole("button", { name: "Save duty cycle" }).click();
    await page.waitForURL(/\/duty-cycles\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page.getByRole("heading", { name }).waitFor();
    await page.getByText("Built without a file").first().waitFor();
    await page.getByText("Turns (4)").waitFor();
    // On a phone the page scrolls down, not sideways (tables and charts scroll inside their box).
    await page.setViewportSize({ width: 375, height: 740 });
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);

    // After saving, the work can still be changed from the page: 60 cycles an hour instead of
    // 40 rebuilds the turns (4 a cycle: 240 per hour) under the new name, on the same record.
    await page.setViewportSize({ width: 1366, height: 900 });
    const id = page.url().split("/").pop()!;
    await page.getByRole("link", { name: "Edit the work" }).click();
    await page.waitForURL(`${baseUrl}/duty-cycles/${id}/edit`);
    expect(await page.getByLabel("Duty cycle name").inputValue()).toBe(name);
    await page.getByLabel(/^Cycles per hour/).fill("60");
    await page.getByText("240.0").first().waitFor();
    await page.getByLabel("Duty cycle name").fill(`${name} (busy season)`);
    await page.getByRole("button", { name: "Save changes" }).click();
    await page.waitForURL(`${baseUrl}/duty-cycles/${id}`);
    await page.getByRole("heading", { name: `${name} (busy season)` }).waitFor();
    const stored = (await (
      await page.request.get(`${baseUrl}/api/v1/duty-cycles/${id}`)
    ).json()) as {
      turnsPerHour: number;
      version: number;
    };
    expect(stored.turnsPerHour).toBeCloseTo(240, 6);
    expect(stored.version).toBe(2);
    expect(errors).toEqual([]);
    await page.close();
  });
});
