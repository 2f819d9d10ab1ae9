import { readFile } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import Papa from "papaparse";
import { and, eq } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import { customers, dealerships, machines } from "@/db/schema";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";

// An estimator's day in the workspace: a new customer, a tractor with a track-rod linkage, the
// customer's turn schedule uploaded, an estimate run, its table read and its turns exported.
// Invented data throughout.
const SCHEDULE_CSV = [
  "label,radius (m),heading change (deg),speed (m/s),count per hour,surface,direction",
  "Headland U-turn,6,180,1.5,16,firm soil,left",
  "Headland U-turn,6,180,1.5,16,firm soil,right",
  "Yard corner,8,90,1.2,6,concrete,left",
  "=cmd|' /C calc'!A0,12,45,2,2,gravel,right",
].join("\n");

describe("workspace journey", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await getPool().end();
  });

  it("creates a customer and a linkage machine, uploads a duty cycle, runs an estimate and exports its turns", async () => {
    const tag = uniqueTag();
    const customerName = `Thornbury Fen Farm ${tag}`;
    const context = await browser.newContext({ acceptDownloads: true });
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");

    // 1. Customer
    await page.goto(`${baseUrl}/customers/new`);
    await page.getByLabel("Name").fill(customerName);
    await page.getByLabel("Main contact").fill("Perpetua Ashdown");
    await page.getByRole("button", { name: "Add customer" }).click();
    await page.waitForURL(/\/customers\/[0-9a-f-]{36}$/);
    const customerId = page.url().split("/").pop()!;
    await page.getByRole("heading", { name: customerName }).waitFor();

    // The header search finds the new customer; the keyboard alone opens it.
    await page.goto(`${baseUrl}/dashboard`);
    await page
      .getByRole("combobox", { name: "Search customers and machines" })
      .fill(`Thornbury Fen Farm ${tag}`);
    await page
      .getByRole("search")
      .getByRole("link", { name: new RegExp(customerName) })
      .waitFor();
    await page.keyboard.press("ArrowDown");
    await page.keyboard.press("Enter");
    await page.waitForURL(`${baseUrl}/customers/${customerId}`);

    // 2. Machine with a track-rod (trapezoid) linkage; the geometry view follows the form.
    await page.getByRole("link", { name: "Add a machine" }).click();
    await page.waitForURL(/\/machines\/new/);
    await page.getByLabel(/^Name/).fill(`Thornbury 120 hp tractor ${tag}`);
    await page.getByLabel(/^Steering layout/).selectOption("trapezoid");
    await page.getByLabel(/^Steering arm angle/).fill("18");
    // A new machine starts blank: every figure comes from the machine itself.
    expect(await page.getByLabel(/^Wheelbase/).inputValue()).toBe("");
    await page.getByLabel(/^Wheelbase/).fill("2.7");
    for (const [axle, figures] of [
      ["front", { track: "1.9", load: "2800", depth: "40", replace: "10", price: "1200" }],
      ["rear", { track: "1.9", load: "4200", depth: "50", replace: "12", price: "2000" }],
    ] as const) {
      const fields = page.getByTestId(`axle-${axle}`);
      expect(await fields.getByLabel(/^Axle load, empty/).inputValue()).toBe("");
      await fields.getByLabel(/^Track(?! rod)/).fill(figures.track);
      await fields.getByLabel(/^Axle load, empty/).fill(figures.load);
      await fields.getByLabel(/^Lug depth, new/).fill(figures.depth);
      await fields.getByLabel(/^Lug depth at replacement/).fill(figures.replace);
      await fields.getByLabel(/^Price per tyre/).fill(figures.price);
    }
    const sizes = page.getByLabel(/^Tyre size/);
    await sizes.nth(0).fill("380/85R24");
    await sizes.nth(1).fill("460/85R34");
    await page.getByText(/Reads as 460 mm wide/).waitFor();
    // The lead shows live once the gear ratio is in: 1.3 on these sizes runs the front axle
    // slower than the rear, outside the common band, and the form says so before any estimate.
    await page.getByLabel(/^Front axle gear ratio/).fill("1.3");
    await page.getByTestId("lead-warning").waitFor();
    expect(await page.getByTestId("lead-check").textContent()).toMatch(/−\d\.\d %/);
    await page.getByTestId("percent-ackermann").waitFor();
    expect(await page.getByTestId("percent-ackermann").textContent()).toMatch(/^\d+ %$/);
    await page.getByRole("button", { name: "Add machine" }).click();
    await page.waitForURL(/\/machines\/[0-9a-f-]{36}$/);
    const machineId = page.url().split("/").pop()!;

    // 3. Duty cycle: the customer's turn schedule through the upload page.
    await page.goto(`${baseUrl}/duty-cycles/upload`);
    await page.getByLabel("CSV file").setInputFiles({
      name: "thornbury-schedule.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(SCHEDULE_CSV),
    });
    await page.getByLabel("What the file holds").selectOption("schedule");
    await page.getByLabel("Duty cycle name").fill(`Spring drilling ${tag}`);
    await page.getByLabel("Customer", { exact: true }).selectOption({ label: customerName });
    await page.getByRole("button", { name: "Import" }).click();
    await page.waitForURL(/\/duty-cycles\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    const dutyCycleId = page.url().split("/").pop()!;
    await expect
      .poll(
        async () =>
          (
            (await (
              await page.request.get(`${baseUrl}/api/v1/duty-cycles/${dutyCycleId}`)
            ).json()) as { status: string }
          ).status,
        { timeout: 30_000, interval: 500 },
      )
      .toBe("ready");

    // 4. Estimate
    await page.goto(`${baseUrl}/estimates/new?customerId=${customerId}&machineId=${machineId}`);
    await page.getByLabel("Duty cycle").selectOption({ label: `Spring drilling ${tag}` });
    await page.getByRole("button", { name: "Run estimate" }).click();
    await page.waitForURL(/\/estimates\/[0-9a-f-]{36}$/, { timeout: 30_000 });

    // 5. Read the per-position table.
    const table = page.getByTestId("positions-table");
    await table.waitFor();
    const rows = table.locator("tbody tr");
    expect(await rows.count()).toBe(4);
    const positions = await rows.locator("th").allTextContents();
    expect(positions.map((p) => p.replace("wears first", "").trim())).toEqual([
      "Front left",
      "Front right",
      "Rear left",
      "Rear right",
    ]);
    expect(await table.getByText("wears first").count()).toBe(1);
    const hours = Number(
      (await rows.first().locator("td").nth(4).textContent())!.replace(/,/g, ""),
    );
    expect(hours).toBeGreaterThan(0);
    expect(await page.getByText("Estimates only: not load, pressure or speed advice").count()).toBe(
      1,
    );

    // 6. Export the turns as CSV.
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download turns (CSV)" }).click(),
    ]);
    const text = await readFile((await download.path())!, "utf8");
    const parsed = Papa.parse<Record<string, string>>(text.trim(), { header: true }).data;
    expect(parsed.length).toBe(4 * 4); // four turn kinds, four wheels each
    expect(new Set(parsed.map((r) => r.position))).toEqual(
      new Set(["front-left", "front-right", "rear-left", "rear-right"]),
    );
    // The spreadsheet-formula label comes back as inert text.
    expect(parsed.some((r) => r.label!.startsWith("'=cmd"))).toBe(true);
    expect(parsed.every((r) => !r.label!.startsWith("="))).toBe(true);
    await context.close();
  });

  it("a customer account sees only its own records, read-only, and no templates", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, "morwenna@hollinvale.test");
    await page.goto(`${baseUrl}/customers`);
    await page.waitForURL(/\/customers\/[0-9a-f-]{36}$/);
    await page.getByRole("heading", { name: "Hollin Vale Farm" }).waitFor();
    expect(await page.getByRole("button", { name: "Save customer" }).count()).toBe(0);

    await page.goto(`${baseUrl}/machines`);
    const machineLinks = page.getByRole("table").getByRole("link");
    await machineLinks.first().waitFor();
    const names = await machineLinks.allTextContents();
    // Other journeys add machines for this customer too, so the list is checked against the
    // machines on record for it rather than against names.
    const own = await getDb()
      .select({ name: machines.name })
      .from(machines)
      .innerJoin(customers, eq(customers.id, machines.customerId))
      .innerJoin(dealerships, eq(dealerships.id, customers.dealershipId))
      .where(and(eq(customers.name, "Hollin Vale Farm"), eq(dealerships.slug, "brackenridge")));
    expect(names.length).toBeGreaterThan(0);
    const allowed = new Set([...own.map((m) => m.name), "Hollin Vale Farm"]);
    expect(names.filter((n) => !allowed.has(n.trim()))).toEqual([]);
    for (const m of own) expect(names.map((n) => n.trim())).toContain(m.name);
    expect(await page.getByRole("link", { name: "Add a machine" }).count()).toBe(0);

    await machineLinks.first().click();
    await page.getByTestId("geometry-view").waitFor();
    expect(await page.getByLabel(/^Wheelbase/).isDisabled()).toBe(true);
    expect(await page.getByRole("button", { name: "Save machine" }).count()).toBe(0);

    await page.goto(`${baseUrl}/machines/templates`);
    await page.waitForURL(`${baseUrl}/machines`);
    await context.close();
  });

  it("workspace pages fit a phone screen without sideways scrolling", async () => {
    const context = await browser.newContext({ viewport: { width: 375, height: 740 } });
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");
    const estimate = (await (
      await page.request.get(`${baseUrl}/api/v1/estimates?pageSize=1`)
    ).json()) as {
      items: { id: string; machineId: string }[];
    };
    const first = estimate.items[0]!;
    for (const path of [
      "/dashboard",
      "/customers",
      "/machines",
      "/estimates",
      `/estimates/${first.id}`,
      `/machines/${first.machineId}`,
    ]) {
      await page.goto(`${baseUrl}${path}`);
      await page.waitForLoadState("networkidle");
      const overflow = await page.evaluate(
        () => document.documentElement.scrollWidth - window.innerWidth,
      );
      expect(overflow, path).toBeLessThanOrEqual(0);
    }
    await context.close();
  });
});
