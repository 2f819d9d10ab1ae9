import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";

// "Would another setup save money?": an estimator opens the demo tractor's estimate, builds two
// options (re-set steering arms, a wider front track), reads the comparison, then sweeps the
// front track. Invented scenario and figures throughout.
describe("options journey", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("goes from an estimate to two options, their comparison and a sweep", async () => {
    const tag = uniqueTag();
    const page = await browser.newPage();
    await signIn(page, "estimator@brackenridge.test");

    // 1. The seeded estimate of the demo row-crop tractor.
    await page.goto(`${baseUrl}/estimates`);
    await page.getByLabel("Find an estimate").fill("140 hp row-crop tractor");
    // The search lands in the address once typing pauses; wait for it, as a reader waits for
    // the list to settle, so that late update does not follow the click.
    await page.waitForURL(/[?&]q=140/);
    await page
      .getByRole("link", { name: /Hollin Vale Farm's 140 hp row-crop tractor/ })
      .first()
      .click();
    await page.waitForURL(/\/estimates\/[0-9a-f-]{36}$/);
    const estimateId = page.url().split("/").pop()!;

    // 2. Try another setup: two options from the changes this layout offers.
    await page.getByRole("link", { name: "Try another setup" }).click();
    await page.waitForURL(`${baseUrl}/estimates/${estimateId}/try-setup`);
    const menu = page.getByTestId("option-1").getByLabel("What to change");
    const offered = await menu.locator("option").allTextContents();
    expect(offered).toContain("Steering arm angle");
    expect(offered).not.toContain("Hinge position"); // not on a tractor with a linkage
    await page.getByLabel("Title").fill(`Spring proposals ${tag}`);

    const first = page.getByTestId("option-1");
    await first.getByLabel("Name").fill("Re-set arms");
    await first.getByLabel(/^One-off cost/).fill("480");
    await menu.selectOption("parameter:armAngle");
    await first.getByLabel(/^Steering arm angle/).fill("14");

    const second = page.getByTestId("option-2");
    await second.getByLabel("Name").fill("Wider front");
    await second.getByLabel(/^One-off cost/).fill("900");
    await second.getByLabel("What to change").selectOption("parameter:frontTrack");
    await second.getByLabel(/^Front track/).fill("2");
    // The track caution sits beside the option that changes track.
    await second.getByText(/machine maker's track settings/).waitFor();

    await page.getByRole("button", { name: "Compare with today's setup" }).click();
    await page.waitForURL(/\/comparisons\/[0-9a-f-]{36}$/);
    const comparisonUrl = page.url();

    // 3. The comparison: today and both options, a table per position, charts and cautions.
    await page.getByRole("heading", { name: `Spring proposals ${tag}` }).waitFor();
    expect(await page.getByTestId("option-card").count()).toBe(3);
    for (const pos of ["front-left", "front-right", "rear-left", "rear-right"]) {
      const rows = page.getByTestId(`position-table-${pos}`).getByRole("row");
      expect(await rows.count()).toBe(4);
    }
    const wider = page.getByRole("region", { name: "Wider front" });
    await wider.getByText(/machine maker's track settings/).waitFor();
    expect(await wider.getByTestId("reasons").getByRole("listitem").count()).toBeGreaterThan(0);
    expect(
      await page.getByRole("region", { name: "Re-set arms" }).getByTestId("option-caution").count(),
    ).toBe(0);
    expect(await page.getByRole("img", { name: /Tyre cost per operating hour/ }).count()).toBe(1);
    expect(
      await page.getByRole("img", { name: /Tread wear per 100 operating hours/ }).count(),
    ).toBe(1);
    expect(await page.getByRole("img", { name: /Cost to date over/ }).count()).toBe(1);
    // Money carries the dealership's currency (pounds in the invented scenario).
    expect(await page.getByTestId("comparison-verdict").textContent()).toMatch(/£/);

    // Rerun stores version 2 and opens it.
    await page.getByRole("button", { name: "Rerun as a new version" }).click();
    await page.waitForURL((u) => u.href !== comparisonUrl && /\/comparisons\//.test(u.href));
    await page
      .getByText(/version 2/)
      .first()
      .waitFor();
    // Both versions are listed; the first is a link back to what it said.
    const versions = page.getByRole("navigation", { name: "Versions" });
    await versions.getByText(/^2 \(this one/).waitFor();
    await versions.getByRole("link", { name: /^1 / }).click();
    await page.waitForURL(comparisonUrl);
    await page
      .getByText(/version 1/)
      .first()
      .waitFor();
    await page.goBack();
    await versions.getByText(/^2 \(this one/).waitFor();

    // 4. Sweep the front track from the comparison.
    await page.getByRole("link", { name: "Sweep a setting" }).click();
    await page.waitForURL(`${baseUrl}/estimates/${estimateId}/sweep`);
    await page.getByLabel("Setting", { exact: true }).selectOption("frontTrack");
    await page.getByLabel(/^From/).fill("1.6");
    await page.getByLabel(/^To/).fill("2.2");
    await page.getByLabel("Points").fill("13");
    await page.getByLabel(/^Highest allowed/).fill("2.1");
    await page.getByRole("button", { name: "Run the sweep" }).click();
    await page.waitForURL(/\/sweeps\/[0-9a-f-]{36}$/);
    await page.getByRole("img", { name: /against front track/ }).waitFor();
    const rows = page.getByTestId("sweep-table").getByRole("row");
    expect(await rows.count()).toBe(14);
    expect(await rows.last().textContent()).toMatch(/outside the declared limits/);
    expect(await page.getByTestId("sweep-best").textContent()).toMatch(/ m$/);
    await page.getByTestId("sweep-caution").first().waitFor();

    // 5. The machine page lists the comparison and the sweep.
    await page.getByRole("link", { name: /Hollin Vale Farm's 140 hp row-crop tractor/ }).click();
    await page.waitForURL(/\/machines\/[0-9a-f-]{36}$/);
    await page
      .getByRole("link", { name: `Spring proposals ${tag}` })
      .first()
      .waitFor();
    await page
      .getByRole("link", { name: /front track swept/ })
      .first()
      .waitFor();
    await page.close();
  });
});
