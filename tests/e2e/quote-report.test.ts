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

// The estimator turns an estimate into a quote report, issues and shares it; the customer
// follows the e-mailed link, signs in, reads it, downloads the PDF and asks a question; the
// estimator then sees the question and when the customer opened the report.
const db = getDb();
const CUSTOMER_EMAIL = "morwenna@hollinvale.test";
const ESTIMATOR_EMAIL = "estimator@brackenridge.test";

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

  it("issue, share, customer opens from the e-mail, downloads the PDF, asks; estimator sees it", async () => {
    const dealer = await browser.newContext();
    const est = await dealer.newPage();
    await signIn(est, ESTIMATOR_EMAIL, DEMO_PASSWORD);
    await est.goto(`${baseUrl}/estimates/${estimateId}`);
    await est.getByRole("button", { name: "Prepare a quote report" }).click();
    await est.waitForURL(/\/reports\/[0-9a-f-]{36}$/);
    const reportId = new URL(est.url()).pathname.split("/").pop()!;
    await est.getByLabel("Recommendations").fill("Rotate the front tyres at the next service.");
    await est.getByRole("button", { name: "Save draft" }).click();
    await est.getByRole("button", { name: "Issue report" }).click();
    await est.getByTestId("report-status").getByText("Issued").waitFor();
    // The current version shows on the page with money in the dealership's currency.
    await est.getByTestId("option-cost").getByText(/£/).waitFor();

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
    await page.getByText("Rotate the front tyres at the next service.").waitFor();
    await page
      .getByText(/mounting|Mounting/)
      .first()
      .waitFor();
    // The customer's navigation is the portal's, with no dealer workspace in it.
    const nav = await page.getByRole("navigation", { name: "Main" }).innerText();
    expect(nav).not.toContain("Estimates");
    expect(nav).not.toContain("Duty cycles");

    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("link", { name: "Download PDF" }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^hollin-vale-farm-.+-v1\.pdf$/);
    const dir = mkdtempSync(join(tmpdir(), "e2e-report-"));
    const file = join(dir, download.suggestedFilename());
    await download.saveAs(file);
    expect(readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");
    // The first page renders as an image (poppler's pdftoppm).
    execFileSync("pdftoppm", ["-f", "1", "-l", "1", "-r", "50", "-png", file, join(dir, "page")]);
    expect(existsSync(join(dir, "page-1.png"))).toBe(true);

    await page.getByLabel("Your question").fill("Would a wider rear tyre last longer?");
    const asked = new Date(Date.now() - 2000);
    await page.getByRole("button", { name: "Send question" }).click();
    await page.getByText("Would a wider rear tyre last longer?").waitFor();
    const question = await waitForMail({
      db,
      to: ESTIMATOR_EMAIL,
      since: asked,
      subjectIncludes: "Question",
    });
    expect(question.text).toContain("wider rear tyre");

    // The portal home lists the shared report.
    await page.goto(`${baseUrl}/dashboard`);
    await page.getByRole("heading", { name: "Hollin Vale Farm" }).waitFor();
    await page.getByTestId("reports-table").getByText("Opened").waitFor();

    await est.reload();
    await est.getByText("Would a wider rear tyre last longer?").waitFor();
    const opened = await est.getByTestId("first-opened").first().innerText();
    expect(opened).not.toBe("not yet");
    await est.getByTestId("report-status").getByText("Opened").waitFor();
    await customer.close();
    await dealer.close();
  });
});
