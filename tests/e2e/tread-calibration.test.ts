import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";

// A fitter in the yard with a phone (390 px wide): reads a tractor's tyres, imports the earlier
// visits from the depth gauge's CSV, sees the estimate calibrate and the tyre plan move when the
// next reading shows faster wear. Invented data throughout.

async function json<T>(
  page: Page,
  path: string,
  init?: { method: string; data: unknown },
): Promise<T> {
  const res = init
    ? await page.request.fetch(`${baseUrl}${path}`, { method: init.method, data: init.data })
    : await page.request.get(`${baseUrl}${path}`);
  expect(res.status(), `${path}: ${await res.text()}`).toBeLessThan(300);
  return (await res.json()) as T;
}

async function enterReading(
  page: Page,
  position: string,
  v: { date: string; hours: number; inner: number; centre: number; outer: number },
) {
  await page.getByRole("radio", { name: new RegExp(`^${position}`) }).click();
  await page.getByLabel("Date").fill(v.date);
  await page.getByLabel(/^Hour meter/).fill(String(v.hours));
  await page.getByLabel(/^Inner shoulder/).fill(String(v.inner));
  await page.getByLabel(/^Centre/).fill(String(v.centre));
  await page.getByLabel(/^Outer shoulder/).fill(String(v.outer));
  await page.getByRole("button", { name: /^Save .* reading$/ }).click();
  await page.getByText(`${position} saved.`).first().waitFor();
}

describe("tread readings on a phone", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("enters readings at 390 px, sees the calibrated estimate change and the plan move", async () => {
    const tag = uniqueTag();
    const context = await browser.newContext({
      viewport: { width: 390, height: 844 },
      hasTouch: true,
      isMobile: true,
    });
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test");

    // A fresh copy of the demo row-crop tractor for the demo farm, with an estimate on the farm's
    // own duty cycle, so this run starts with no readings.
    const machines = await json<{ items: { id: string; name: string }[] }>(
      page,
      "/api/v1/machines?q=row-crop&pageSize=10",
    );
    const demo = machines.items.find((m) => /row-crop tractor/.test(m.name))!;
    const demoMachine = await json<{ spec: object; customerId: string; kind: string }>(
      page,
      `/api/v1/machines/${demo.id}`,
    );
    const demoEstimates = await json<{ items: { id: string }[] }>(
      page,
      `/api/v1/estimates?machineId=${demo.id}`,
    );
    const demoEstimate = await json<{ dutyCycleId: string }>(
      page,
      `/api/v1/estimates/${demoEstimates.items[0]!.id}`,
    );
    const machine = await json<{ id: string }>(page, "/api/v1/machines", {
      method: "POST",
      data: {
        customerId: demoMachine.customerId,
        kind: demoMachine.kind,
        spec: { ...demoMachine.spec, name: `Yard test tractor ${tag}` },
      },
    });
    await json(page, "/api/v1/estimates", {
      method: "POST",
      data: { machineId: machine.id, dutyCycleId: demoEstimate.dutyCycleId },
    });

    await page.goto(`${baseUrl}/machines/${machine.id}/tread`);
    await page.getByRole("heading", { name: "Tread and calibration" }).waitFor();
    // No readings of its own yet: it borrows the fit of the demo tractor on the same tyres and ground.
    expect(await page.getByTestId("calibration-status").textContent()).toMatch(
      /Calibrated from the readings of \d+ other machines? with the same tyres and ground/,
    );
    // The position plan's buttons are thumb-sized on the phone.
    const box = await page.getByRole("radio", { name: /^Front left/ }).boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    expect(await page.getByLabel(/^Centre/).getAttribute("inputmode")).toBe("decimal");

    // First visit through the form: all four tyres.
    const first = { date: "2026-03-02", hours: 1000 };
    for (const [position, d] of [
      ["Front left", 34],
      ["Front right", 34],
      ["Rear left", 44],
      ["Rear right", 44],
    ] as const) {
      await enterReading(page, position, { ...first, inner: d, centre: d, outer: d });
    }

    // Three more visits from the gauge's CSV, each 200 h and four weeks apart.
    const rows = ["position,date,hour meter,inner mm,centre mm,outer mm"];
    [1, 2, 3].forEach((k) => {
      const date = ["2026-03-30", "2026-04-27", "2026-05-25"][k - 1];
      const hours = 1000 + 200 * k;
      rows.push(`FL,${date},${hours},${34 - 2.2 * k},${34 - 2.2 * k},${34 - 2.2 * k}`);
      rows.push(`FR,${date},${hours},${34 - 2.1 * k},${34 - 2.1 * k},${34 - 2.1 * k}`);
      rows.push(`RL,${date},${hours},${44 - 1.3 * k},${44 - 1.3 * k},${44 - 1.3 * k}`);
      rows.push(`RR,${date},${hours},${44 - 1.2 * k},${44 - 1.2 * k},${44 - 1.2 * k}`);
    });
    await page.getByLabel("CSV file").setInputFiles({
      name: "gauge.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(rows.join("\n")),
    });
    await page.getByRole("button", { name: "Import readings" }).click();
    await page.getByText("12 readings imported.").waitFor();

    await page
      .getByTestId("calibration-status")
      .filter({ hasText: "Calibrated from this machine's readings" })
      .waitFor();
    const wearBefore = await page.getByTestId("wear-front-left").textContent();
    const dueBefore = await page
      .locator('[data-testid="machine-plan"] [data-position="front-left"]')
      .textContent();
    expect(dueBefore).toMatch(/\d{4}/);

    // The next visit: the front-left tyre has lost far more, with its inner shoulder worn.
    await enterReading(page, "Front left", {
      date: "2026-06-22",
      hours: 1800,
      inner: 17,
      centre: 21,
      outer: 21.5,
    });
    await page.getByTestId("wear-front-left").filter({ hasNotText: wearBefore! }).waitFor();
    const dueAfter = await page
      .locator('[data-testid="machine-plan"] [data-position="front-left"]')
      .textContent();
    expect(dueAfter).not.toBe(dueBefore);
    // Uneven wear raises an alert with the usual causes.
    await page
      .getByTestId("tread-alerts")
      .getByText(/inner shoulder is .* lower/)
      .waitFor();
    expect(await page.getByTestId("tread-alerts").textContent()).toMatch(/misalignment/);

    // Model only against calibrated: the toggle shows the published model's figure.
    await page.getByRole("button", { name: "Model only" }).click();
    expect(await page.getByTestId("calibration-status").textContent()).toMatch(
      /Not calibrated: the wear model as published/,
    );

    // The dealership's tyre plan lists the machine with calibrated wear.
    await page.goto(`${baseUrl}/tyre-plan`);
    await page
      .getByTestId("plan-items")
      .locator(`[data-machine="${machine.id}"][data-position="front-left"]`)
      .getByText("calibrated")
      .waitFor();
    await context.close();
  });
});
