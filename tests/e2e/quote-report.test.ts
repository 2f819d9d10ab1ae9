import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { and, eq } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import { customers, dealerships, estimates } from "@/db/schema";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";

// The journey: the estimator builds a comparison of setups, prepares a quote report from
// it, issues and shares it; the customer follows the e-mailed link, signs in, reads it, switches
// between the options the dealer prepared, downloads the PDF and asks a question; the estimator
// then sees the question and when the customer opened the report. A shorter check covers the
// estimate page's own "Prepare a quote report" button.
const db = getDb();
const CUSTOMER_EMAIL = "morwenna@hollinvale.test";
const ESTIMATOR_EMAIL = "estimator@brackenridge.test";
/** Three changes the dealer prices against the tractor as fitted (invented demo figures). */
const OPTIONS = [
  {
    name: "Steering arms re-set to 20°",
    changes: [{ kind: "parameter", parameter: "armAngle", value: 20 }],
    oneOffCost: 350,
  },
  {
    name: "Ackermann-corrected linkage",
    changes: [{ kind: "steering", steering: { layout: "ideal", maxLock: 52 } }],
    oneOffCost: 1800,
  },
  {
    name: "Narrower front track (1.8 m)",
    changes: [{ kind: "parameter", parameter: "frontTrack", value: 1.8 }],
    oneOffCost: 600,
  },
];
const hours = (h: number) => `${Math.round(h).toLocaleString("en-GB")} h`;

describe("quote report journey", () => {
  let browser: Browser;
  let estimateId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    const [row] = await db
      .select({ id: estimates.id })
      .from(estimates)
      .innerJoin(customers, eq(customers.id, estimates.customerId))
      .innerJoin(dealerships, eq(dealerships.id, estimates.dealershipId))
      .where(and(eq(customers.name, "Hollin Vale Farm"), eq(dealerships.slug, "brackenridge")))
      .limit(1);
    estimateId = row!.id;
  });
  afterAll(async () => {
    await browser?.close();
    await getPool().end();
  });

  it("the estimate page's button opens a draft report built from that estimate", async () => {
    const dealer = await browser.newContext();
    const est = await dealer.newPage();
    await signIn(est, ESTIMATOR_EMAIL, DEMO_PASSWORD);
    await est.goto(`${baseUrl}/estimates/${estimateId}`);
    await est.getByRole("button", { name: "Prepare a quote report" }).click();
    await est.waitForURL(/\/reports\/[0-9a-f-]{36}$/);
    await est.getByTestId("report-status").getByText("Draft").waitFor();
    await est.getByRole("link", { name: "source estimate" }).waitFor();
    await dealer.close();
  });

  it("comparison, report, share; the customer opens it from the e-mail, switches options, downloads the PDF, asks; the estimator sees it", async () => {
    const dealer = await browser.newContext();
    const est = await dealer.newPage();
    await signIn(est, ESTIMATOR_EMAIL, DEMO_PASSWORD);
    // The comparison through its API with the estimator's session (its screens are built
    // elsewhere); then the report draft exactly as their "Prepare a quote report" button asks.
    const compared = await dealer.request.post(`${baseUrl}/api/v1/comparisons`, {
      data: { estimateId, options: OPTIONS, hours: 2000 },
    });
    expect(compared.status()).toBe(201);
    const comparison = (await compared.json()) as {
      id: string;
      result: { options: { name: string; paybackHours: number | null }[] };
    };
    await est.goto(`${baseUrl}/reports`);
    const created = await est.evaluate(async (comparisonId) => {
      const res = await fetch("/api/v1/reports", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ comparisonId }),
      });
      return { status: res.status, body: (await res.json()) as { id: string } };
    }, comparison.id);
    expect(created.status).toBe(201);
    const reportId = created.body.id;
    await est.goto(`${baseUrl}/reports/${reportId}`);
    await est.getByTestId("report-status").getByText("Draft").waitFor();
    await est.getByText("built from a stored comparison of options").waitFor();
    await est.getByLabel("Recommendations").fill("Re-set the steering arms at the next service.");
    await est.getByRole("button", { name: "Save draft" }).click();
    await est.getByRole("button", { name: "Issue report" }).click();
    await est.getByTestId("report-status").getByText("Issued").waitFor();
    // The current version shows on the page with money in the dealership's currency.
    await est.getByTestId("option-cost").getByText(/£/).waitFor();
    expect(await est.getByRole("tab").count()).toBe(OPTIONS.length + 1);

    const since = new Date(Date.now() - 2000);
    await est.getByRole("button", { name: "Share with customer" }).click();
    await est.getByText(`Shared with ${CUSTOMER_EMAIL}.`).waitFor();
    const mail = await waitForMail({
      db,
      to: CUSTOMER_EMAIL,
      since,
      subjectIncludes: "shared a tyre report",
    });
    const link = linkFrom(mail, `/reports/${reportId}`);
    expect(new URL(link).origin).toBe(baseUrl);

    // The customer, signed out, follows the link, signs in and lands on the report.
    const customer = await browser.newContext({ acceptDownloads: true });
    const page = await customer.newPage();
    await page.goto(link);
    await page.waitForURL((u) => u.pathname === "/sign-in");
    await page.getByLabel("E-mail address").first().fill(CUSTOMER_EMAIL);
    await page.getByLabel("Password", { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => u.pathname === `/reports/${reportId}`);
    await page.getByText("Re-set the steering arms at the next service.").waitFor();
    await page
      .getByText(/mounting|Mounting/)
      .first()
      .waitFor();
    // The customer's navigation is the portal's, with no dealer workspace in it.
    const nav = await page.getByRole("navigation", { name: "Main" }).innerText();
    expect(nav).not.toContain("Estimates");
    expect(nav).not.toContain("Duty cycles");

    // Read-only switching between the options the dealer prepared: each shows its own payback,
    // as the comparison computed it, and the track change shows its caution beside it.
    const switcher = page.getByRole("tablist", { name: "Options the dealer prepared" });
    for (const [i, option] of OPTIONS.entries()) {
      await switcher.getByRole("tab", { name: option.name }).click();
      await switcher.getByRole("tab", { name: option.name, selected: true }).waitFor();
      const payback = comparison.result.options[i]!.paybackHours;
      await page
        .getByTestId("option-payback")
        .getByText(payback === null ? "Does not pay back" : hours(payback), { exact: true })
        .waitFor();
    }
    await page.getByText(/track settings and wheel-offset limits/).waitFor();
    await switcher.getByRole("tab", { name: "As fitted today" }).click();
    await page.getByTestId("option-payback").getByText("Baseline").waitFor();
    expect(await page.getByRole("button", { name: "Save draft" }).count()).toBe(0);

    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download PDF" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^hollin-vale-farm-.+-v1\.pdf$/);
    const dir = mkdtempSync(join(tmpdir(), "e2e-report-"));
    const file = join(dir, download.suggestedFilename());
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");
    // Every option is in the PDF (poppler's pdftotext), and the first page renders (pdftoppm).
    const text = execFileSync("pdftotext", [file, "-"]).toString().replace(/\s+/g, " ");
    for (const option of OPTIONS) expect(text).toContain(option.name);
    execFileSync("pdftoppm", ["-f", "1", "-l", "1", "-r", "50", "-png", file, join(dir, "page")]);
    expect(existsSync(join(dir, "page-1.png"))).toBe(true);

    await page.getByLabel("Your question").fill("Would the narrower track suit the yard?");
    const asked = new Date(Date.now() - 2000);
    await page.getByRole("button", { name: "Send question" }).click();
    await page.getByText("Would the narrower track suit the yard?").waitFor();
    const question = await waitForMail({
      db,
      to: ESTIMATOR_EMAIL,
      since: asked,
      subjectIncludes: "Question",
    });
    expect(question.text).toContain("narrower track");

    // The portal home lists the shared report.
    await page.goto(`${baseUrl}/dashboard`);
    await page.getByRole("heading", { name: "Hollin Vale Farm" }).waitFor();
    await page.getByTestId("reports-table").getByText("Opened").first().waitFor();

    await est.reload();
    await est.getByText("Would the narrower track suit the yard?").waitFor();
    const opened = await est.getByTestId("first-opened").first().innerText();
    expect(opened).not.toBe("not yet");
    await est.getByTestId("report-status").getByText("Opened").waitFor();
    await customer.close();
    await dealer.close();
  });
});
