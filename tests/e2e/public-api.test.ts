import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { baseUrl, launchBrowser, signIn } from "@/tests/support/browser";
import { uniqueTag } from "@/tests/support/session";
import { TELEMATICS_MAPPING, knownTelematicsCsv } from "@/tests/integration/duty-cycles/support";

// A dealer admin makes an API token in the browser; then a script, with nothing but HTTP
// requests carrying that token (as curl would send them), uploads and imports a telematics CSV
// and fetches the estimate it runs. Invented data (the seeded demo dealership).

describe("public API journey", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("a token made in the browser drives upload, import and estimate over plain HTTP", async () => {
    const page = await browser.newPage();
    await signIn(page, "admin@brackenridge.test");
    await page.goto(`${baseUrl}/settings/api-tokens`);
    const name = `Telematics bridge ${uniqueTag()}`;
    await page.getByLabel("Name").fill(name);
    await page.getByLabel(/^Read and write/).check();
    await page.getByRole("button", { name: "Make token" }).click();
    const secret = (await page.getByTestId("new-api-token").textContent({ timeout: 15_000 }))!;
    expect(secret).toMatch(/^tcapi_/);
    // Listed without its secret.
    await page.getByRole("cell", { name: new RegExp(name) }).waitFor();
    expect(await page.content()).toContain(secret.slice(0, 12));

    // ── From here on: a script, no browser ──
    const auth = { authorization: `Bearer ${secret}` };
    const json = async (path: string, init: RequestInit = {}) => {
      const res = await fetch(`${baseUrl}${path}`, {
        ...init,
        headers: { ...auth, ...(init.headers as Record<string, string> | undefined) },
      });
      return { status: res.status, body: (await res.json()) as Record<string, any> }; // eslint-disable-line @typescript-eslint/no-explicit-any
    };
    const customers = await json("/api/v1/customers?q=Hollin%20Vale");
    expect(customers.status).toBe(200);
    const customerId = customers.body.items[0].id as string;
    // The dealer's system registers its own machine (a copy of one on record), so this journey's
    // estimate never becomes another journey's demo machine's latest one.
    const machines = await json(`/api/v1/machines?customerId=${customerId}`);
    const onRecord = await json(`/api/v1/machines/${machines.body.items[0].id as string}`);
    const registered = await json("/api/v1/machines", {
      method: "POST",
      body: JSON.stringify({
        customerId,
        kind: onRecord.body.kind,
        spec: { ...onRecord.body.spec, name: `Hollin Vale bridge tractor ${uniqueTag()}` },
      }),
      headers: { "content-type": "application/json" },
    });
    expect(registered.status).toBe(201);
    const machineId = registered.body.id as string;

    const { csv } = knownTelematicsCsv();
    const uploaded = await json("/api/v1/uploads", {
      method: "POST",
      body: csv,
      headers: { "content-type": "text/csv", "x-file-name": "bridge-log.csv" },
    });
    expect(uploaded.status).toBe(201);
    const importBody = JSON.stringify({
      source: "upload",
      name: `Bridge log ${uniqueTag()}`,
      customerId,
      machineId,
      uploadId: uploaded.body.id,
      mapping: TELEMATICS_MAPPING,
    });
    const importHeaders = { "content-type": "application/json", "idempotency-key": uniqueTag() };
    const created = await json("/api/v1/duty-cycles", {
      method: "POST",
      body: importBody,
      headers: importHeaders,
    });
    expect(created.status).toBe(201);
    // A retry of the same request (same key) is answered with the first result.
    const retried = await json("/api/v1/duty-cycles", {
      method: "POST",
      body: importBody,
      headers: importHeaders,
    });
    expect(retried.body.id).toBe(created.body.id);

    let status = "pending";
    for (let i = 0; i < 100 && status !== "ready" && status !== "failed"; i++) {
      await new Promise((r) => setTimeout(r, 300));
      status = (await json(`/api/v1/duty-cycles/${created.body.id}`)).body.status as string;
    }
    expect(status).toBe("ready");

    const estimate = await json("/api/v1/estimates", {
      method: "POST",
      body: JSON.stringify({ machineId, dutyCycleId: created.body.id }),
      headers: { "content-type": "application/json" },
    });
    expect(estimate.status).toBe(201);
    const fetched = await json(`/api/v1/estimates/${estimate.body.id}`);
    expect(fetched.status).toBe(200);
    expect(fetched.body.result.costPerHour).toBeGreaterThan(0);

    // Revoked in the browser: the next request is refused.
    await page.reload();
    await page
      .getByRole("row", { name: new RegExp(name) })
      .getByRole("button", { name: "Revoke" })
      .click();
    await page
      .getByRole("row", { name: new RegExp(name) })
      .getByText("Revoked")
      .first()
      .waitFor();
    expect((await json("/api/v1/customers")).status).toBe(401);
  });

  it("the API reference renders the document offline, under the page CSP", async () => {
    const page = await browser.newPage();
    await page.goto(`${baseUrl}/developers`);
    await page.getByRole("heading", { name: "1. Authenticate" }).waitFor();
    // Swagger UI lists the operations from /api/v1/openapi.json.
    await page.getByText("/api/v1/duty-cycles/{id}").first().waitFor({ timeout: 30_000 });
    await page.getByText("Create a customer").first().waitFor();
    const doc = await (await fetch(`${baseUrl}/api/v1/openapi.json`)).json();
    expect(doc.openapi).toBe("3.1.0");
  });
});
