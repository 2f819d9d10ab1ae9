import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";

// Laptop screens as dealers use them (1280 and 1366 px wide), checked like phones are: every
// table on every workspace page must fit inside its card, with nothing to scroll sideways.

type TOverflow = { table: string; scrollWidth: number; clientWidth: number; pastCard: number };

/** Tables wider than the box that holds them, or reaching past their card's edge. */
async function overflowingTables(page: Page): Promise<TOverflow[]> {
  return page.evaluate(() => {
    const out: TOverflow[] = [];
    for (const table of Array.from(document.querySelectorAll("table"))) {
      // Hidden (a closed panel) or for screen readers only (a chart's figures): not on screen.
      if (!table.getClientRects().length || table.closest(".sr-only")) continue;
      let box: HTMLElement | null = table.parentElement;
      while (box && getComputedStyle(box).overflowX === "visible") box = box.parentElement;
      const card = table.closest("section") ?? document.querySelector("main")!;
      const name =
        table.querySelector("caption")?.textContent ?? table.getAttribute("data-testid") ?? "table";
      const scrollWidth = box ? box.scrollWidth : table.scrollWidth;
      const clientWidth = box ? box.clientWidth : table.clientWidth;
      const pastCard = table.getBoundingClientRect().right - card.getBoundingClientRect().right;
      if (scrollWidth > clientWidth + 1 || pastCard > 1)
        out.push({ table: name, scrollWidth, clientWidth, pastCard });
    }
    return out;
  });
}

/** Charts whose drawing reaches past their figure, or that must be scrolled to be read. */
async function clippedCharts(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    for (const figure of Array.from(document.querySelectorAll("figure"))) {
      const name = figure.querySelector("figcaption")?.textContent ?? "chart";
      const right = figure.getBoundingClientRect().right;
      for (const svg of Array.from(figure.querySelectorAll("svg")))
        if (svg.getBoundingClientRect().right > right + 1)
          out.push(`${name}: drawing past the edge`);
      for (const box of Array.from(figure.querySelectorAll<HTMLElement>("div")))
        if (!box.closest(".sr-only") && box.scrollWidth > box.clientWidth + 1)
          out.push(`${name}: scrolls sideways`);
    }
    return out;
  });
}

describe("tables on laptop screens", () => {
  let browser: Browser;
  let paths: string[] = [];
  beforeAll(async () => {
    browser = await launchBrowser();
    const page = await browser.newPage();
    await signIn(page, "admin@brackenridge.test");
    const get = async <T>(path: string) =>
      (await (await page.request.get(baseUrl + path)).json()) as T;
    const estimates = await get<{ items: { id: string; machineId: string; customerId: string }[] }>(
      "/api/v1/estimates?pageSize=1&sort=createdAt&dir=asc",
    );
    const cycles = await get<{ items: { id: string }[] }>(
      "/api/v1/duty-cycles?status=ready&pageSize=1",
    );
    const e = estimates.items[0]!;
    paths = [
      "/dashboard",
      "/customers",
      "/machines",
      "/machines/templates",
      "/estimates",
      "/duty-cycles",
      "/duty-cycles/build",
      "/reports",
      "/tyre-plan",
      "/audit",
      "/team",
      `/customers/${e.customerId}`,
      `/machines/${e.machineId}`,
      `/machines/${e.machineId}/tread`,
      `/estimates/${e.id}`,
      `/duty-cycles/${cycles.items[0]!.id}`,
    ];
    await page.close();
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const width of [1280, 1366]) {
    it(`every table and chart fits its card at ${width} px wide`, async () => {
      const context = await browser.newContext({ viewport: { width, height: 900 } });
      const page = await context.newPage();
      await signIn(page, "admin@brackenridge.test");
      let tables = 0;
      for (const path of paths) {
        await page.goto(`${baseUrl}${path}`);
        await page.waitForLoadState("networkidle");
        tables += await page.locator("table").count();
        expect(await overflowingTables(page), `${path} at ${width} px`).toEqual([]);
        expect(await clippedCharts(page), `${path} charts at ${width} px`).toEqual([]);
        const pageOverflow = await page.evaluate(
          () => document.documentElement.scrollWidth - window.innerWidth,
        );
        expect(pageOverflow, path).toBeLessThanOrEqual(0);
      }
      expect(tables).toBeGreaterThanOrEqual(10);
      await context.close();
    });
  }
});

describe("table state in the URL", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("keeps sort, search and page in the address, so back, forward and shared links work", async () => {
    const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");
    await page.goto(`${baseUrl}/machines`);
    const table = page.getByRole("table", { name: "Machines" });
    await table.locator("tbody tr").first().waitFor();

    // The list opens sorted by name, A to Z; a click on the header turns it round, and the
    // address says so.
    const firstAscending = await table.locator("tbody tr").first().textContent();
    await table.getByRole("button", { name: /^Machine/ }).click();
    await page.waitForURL(/[?&]dir=desc/);
    const sortedUrl = page.url();
    // The rows follow once the new page of results is in.
    await expect
      .poll(() => table.locator("tbody tr").first().textContent())
      .not.toBe(firstAscending);
    const firstSorted = await table.locator("tbody tr").first().textContent();

    // Then search: the address carries the text once typing pauses.
    await page.getByLabel("Find a machine").fill("Hollin");
    await page.waitForURL(/[?&]q=Hollin/);
    await expect
      .poll(async () =>
        (await table.locator("tbody tr").allTextContents()).every((t) => t.includes("Hollin")),
      )
      .toBe(true);

    // Back: the search goes, the sort stays, the box empties.
    await page.goBack();
    await page.waitForURL(sortedUrl);
    await expect.poll(() => page.getByLabel("Find a machine").inputValue()).toBe("");
    await expect.poll(() => table.locator("tbody tr").first().textContent()).toBe(firstSorted);
    // Forward: the search is back.
    await page.goForward();
    await page.waitForURL(/[?&]q=Hollin/);
    await expect.poll(() => page.getByLabel("Find a machine").inputValue()).toBe("Hollin");

    // A shared link opens the same view in a fresh tab.
    const shared = await context.newPage();
    await shared.goto(page.url());
    const sharedTable = shared.getByRole("table", { name: "Machines" });
    await sharedTable.locator("tbody tr").first().waitFor();
    expect(await shared.getByLabel("Find a machine").inputValue()).toBe("Hollin");
    expect(
      await sharedTable.getByRole("columnheader", { name: /^Machine/ }).getAttribute("aria-sort"),
    ).toBe("descending");
    await context.close();
  });

  it("says what is missing on a new customer's empty tables and offers the action", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");
    await page.goto(`${baseUrl}/customers/new`);
    await page.getByLabel("Name").fill(`Larkspur Hollow ${uniqueTag()}`);
    await page.getByRole("button", { name: "Add customer" }).click();
    await page.waitForURL(/\/customers\/[0-9a-f-]{36}$/);
    const card = (title: string) =>
      page.locator("section", { has: page.getByRole("heading", { name: title, exact: true }) });
    await card("Machines").getByText("No machines yet").waitFor();
    expect(await card("Machines").getByRole("link", { name: "Add a machine" }).count()).toBe(1);
    await card("Estimates").getByText("No estimates yet").waitFor();
    expect(
      await card("Estimates").getByRole("link", { name: "Run an estimate" }).getAttribute("href"),
    ).toMatch(/^\/estimates\/new\?customerId=[0-9a-f-]{36}$/);
    expect(await page.getByText("Nothing matches these filters").count()).toBe(0);
    await context.close();
  });
  it("filters quote reports by customer in the address; the farm's own account reads its report", async () => {
    const context = await browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");
    await page.goto(`${baseUrl}/reports`);
    const table = page.getByTestId("reports-table");
    // The demo data holds one issued, shared report for the farm (scripts/seed/demo-reports.ts).
    const seeded = /^Tyre options compared · Hollin Vale Farm's 140 hp row-crop tractor/;
    await table.getByRole("link", { name: seeded }).first().waitFor();

    await page.getByLabel("Customer", { exact: true }).selectOption({ label: "Hollin Vale Farm" });
    await page.waitForURL(/[?&]customerId=[0-9a-f-]{36}/);
    await expect
      .poll(async () => {
        const customers = await table.locator("tbody tr td:nth-child(2)").allTextContents();
        return customers.length > 0 && customers.every((c) => c === "Hollin Vale Farm");
      })
      .toBe(true);

    // A search nothing matches says so; back returns to the farm's reports.
    const filtered = page.url();
    await page.getByLabel("Search", { exact: true }).fill(`no such report ${uniqueTag()}`);
    await page.waitForURL(/[?&]q=no/);
    await page.getByText("Nothing matches these filters.").waitFor();
    await page.goBack();
    await page.waitForURL(filtered);
    await table.getByRole("link", { name: seeded }).first().waitFor();
    expect(await page.getByLabel("Search", { exact: true }).inputValue()).toBe("");

    // The customer's own account sees the report shared with it, and no customer filter.
    const farm = await browser.newContext();
    const portal = await farm.newPage();
    await signIn(portal, "morwenna@hollinvale.test");
    await portal.goto(`${baseUrl}/reports`);
    await portal.getByTestId("reports-table").getByRole("link", { name: seeded }).first().waitFor();
    expect(await portal.getByLabel("Customer", { exact: true }).count()).toBe(0);
    await farm.close();
    await context.close();
  });
});
