import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { getDb, getPool } from "@/db/client";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { uniqueTag } from "@/tests/support/session";
import { DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";
import { DEMO_CUSTOMERS } from "@/scripts/seed/tenancy";

// A dealer admin invites a customer account for one of the seeded customers; the invited
// person follows the e-mailed link, chooses a password and sees only that customer's records.
const db = getDb();
const invited = DEMO_CUSTOMERS.find((c) => c.key === "eastmere")!;
const others = DEMO_CUSTOMERS.filter((c) => c.key !== "eastmere").map((c) => c.name);

describe("inviting a customer by e-mail", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await getPool().end();
  });

  it("admin invites, the customer follows the mailed link and sees only their own records", async () => {
    const email = `contact-${uniqueTag()}@eastmere.test`;
    const since = new Date(Date.now() - 2000);

    const admin = await browser.newPage();
    await signIn(admin, "admin@brackenridge.test", DEMO_PASSWORD);
    await admin.goto(`${baseUrl}/team`);
    await admin.getByLabel("E-mail address").fill(email);
    await admin.getByLabel("Role").selectOption("customer");
    await admin.getByLabel("Customer record").selectOption({ label: invited.name });
    await admin.getByRole("button", { name: "Send invitation" }).click();
    await admin.getByText(`Invitation sent to ${email}.`).waitFor();
    await admin.close();

    const mail = await waitForMail({ db, to: email, since });
    const link = linkFrom(mail, "/invite/");
    expect(new URL(link).origin).toBe(baseUrl);

    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(link);
    await page.getByRole("heading", { name: /Join Brackenridge/ }).waitFor();
    await page.getByLabel("Your name").fill("Ianto Marsh");
    await page.getByLabel("Choose a password").fill("mud on the headland");
    await page.getByLabel("Password again").fill("mud on the headland");
    await page.getByRole("button", { name: "Accept invitation" }).click();
    await page.waitForURL((url) => url.pathname === "/dashboard");

    // The API answers for this session: only the invited customer's record.
    const res = await context.request.get(`${baseUrl}/api/v1/customers`);
    expect(res.status()).toBe(200);
    const body = await res.text();
    expect(body).toContain(invited.name);
    for (const name of others) expect(body).not.toContain(name);

    // And the customers page shows the same.
    await page.goto(`${baseUrl}/customers`);
    await page.getByText(invited.name).first().waitFor();
    const text = await page.locator("main").innerText();
    for (const name of others) expect(text).not.toContain(name);

    // The link was single use.
    const again = await context.newPage();
    await again.goto(link);
    await again.getByText("This invitation was already used.").waitFor();
    await context.close();
  });

  it("a signed-out visitor of a signed-in page is sent to sign-in, and comes back after", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl}/team`);
    await page.waitForURL((url) => url.pathname === "/sign-in");
    await page.getByLabel("E-mail address").fill("admin@brackenridge.test");
    await page.getByLabel("Password", { exact: true }).fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => url.pathname === "/team");
    await page.getByRole("heading", { name: "Team" }).waitFor();
    await context.close();
  });

  it("an estimator does not get the team page", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, "estimator@brackenridge.test", DEMO_PASSWORD);
    await page.goto(`${baseUrl}/team`);
    await page.getByText("Not available for your role").waitFor();
    await context.close();
  });

  it("signs in with an e-mailed link, shown in the development mailbox", async () => {
    const since = new Date(Date.now() - 2000);
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole("tab", { name: "E-mail me a link" }).click();
    await page.getByLabel("E-mail address").fill("morwenna@hollinvale.test");
    await page.getByRole("button", { name: "Send sign-in link" }).click();
    await page.getByText(/a sign-in link is on its way/).waitFor();
    const mail = await waitForMail({ db, to: "morwenna@hollinvale.test", since });
    const link = linkFrom(mail, "/api/auth/callback/nodemailer");

    // The mailbox page lists the message with its link.
    await page.goto(`${baseUrl}/dev/mailbox`);
    await page.getByText("Your Treadcast sign-in link").first().waitFor();

    await page.goto(link);
    await page.waitForURL((url) => url.pathname === "/dashboard");
    const res = await context.request.get(`${baseUrl}/api/v1/customers`);
    expect(res.status()).toBe(200);
    const body = await res.text();
    expect(body).toContain("Hollin Vale Farm");
    expect(body).not.toContain("Eastmere Contracting");
    await context.close();
  });
});
