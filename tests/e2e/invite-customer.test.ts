import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { getDb, getPool } from "@/db/client";
import { baseUrl, launchBrowser } from "@/tests/support/browser";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { uniqueTag } from "@/tests/support/session";
import { DEMO_PASSWORD } from "@/scripts/seed/demo-accounts";
import { DEMO_CUSTOMERS } from "@/scripts/seed/tenancy";

// A dealer admin invites a customer account for one of the seeded customers; the invited
// person follows the e-mailed link, chooses a password and sees only that customer's records.
const db = getDb();
const invited = DEMO_CUSTOMERS.find((c) => c.key === "eastmere")!;
const others = DEMO_CUSTOMERS.filter((c) => c.key !== "eastmere").map((c) => c.name);

async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

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
});
