// Quote reports: issuing freezes the inputs (the database refuses to rewrite an issued version),
// sharing decides what a customer sees, the PDF reads back with poppler's pdftotext, and a logo
// is accepted only when its bytes are a PNG or JPEG.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { eq, sql } from "drizzle-orm";
import sharp from "sharp";
import { getPool } from "@/db/client";
import { machines, reportVersions } from "@/db/schema";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { PATCH as patchMachine } from "@/app/api/v1/machines/[id]/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as listReports, POST as createReport } from "@/app/api/v1/reports/route";
import { GET as getReport, PATCH as patchReport } from "@/app/api/v1/reports/[id]/route";
import { POST as issue } from "@/app/api/v1/reports/[id]/issue/route";
import { GET as getVersion } from "@/app/api/v1/reports/[id]/versions/[version]/route";
import { GET as getPdf } from "@/app/api/v1/reports/[id]/versions/[version]/pdf/route";
import { GET as getCsv } from "@/app/api/v1/reports/[id]/versions/[version]/csv/route";
import { POST as uploadLogoRoute } from "@/app/api/v1/branding/logo/route";
import { PUT as putBranding } from "@/app/api/v1/branding/route";
import { createMailer, type TMailer } from "@/features/auth/server/mailer";
import { shareReport } from "@/features/reports/server/share-report";
import { withdrawReportShare } from "@/features/reports/server/withdraw-report-share";
import { postReportMessage } from "@/features/reports/server/post-report-message";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";
import { linkFrom, waitForMail } from "@/tests/support/mail";
import { createTestMember, uniqueTag } from "@/tests/support/session";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
  BASE,
} from "@/tests/support/records";

let team: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
let otherCustomerId: string;
let machineId: string;
let estimateId: string;
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;
let mailer: TMailer;
const tag = uniqueTag();
const customerName = `Wychwood Farm ${tag}`;

beforeAll(async () => {
  smtp = await startSmtpFake({ port: 0 });
  mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Treadcast <t@example.test>" });
  team = await makeDealership();
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, team.admin.cookie, path, { method: "POST", body });
  customerId = (
    await post(createCustomer, "/api/v1/customers", {
      name: customerName,
      contactName: "Elowen Garrow",
      contactEmail: `elowen-${tag}@wychwood.test`,
    })
  ).body.id;
  otherCustomerId = (
    await post(createCustomer, "/api/v1/customers", { name: `Coldharbour ${tag}` })
  ).body.id;
  machineId = (
    await post(createMachine, "/api/v1/machines", {
      customerId,
      kind: "tractor",
      spec: testTractorSpec(),
    })
  ).body.id;
  const dutyCycleId = (await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId }))
    .id;
  estimateId = (
    await call(createEstimate, team.estimator.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId },
    })
  ).body.id;
  await call(putBranding, team.admin.cookie, "/api/v1/branding", {
    method: "PUT",
    body: { currency: "GBP", contactLine: "Yard Lane, Brackenford" },
  });
});
afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

async function newIssuedReport(title = `Quote ${uniqueTag()}`) {
  const created = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
    method: "POST",
    body: { estimateId, title },
  });
  expect(created.status).toBe(201);
  const id = created.body.id as string;
  const issued = await call(issue, team.estimator.cookie, "x", { method: "POST", params: { id } });
  expect(issued.status).toBe(201);
  return { id, v1: issued.body };
}

describe("issuing", () => {
  it("freezes inputs: editing the machine afterwards leaves the issued report as it was", async () => {
    const { id, v1 } = await newIssuedReport();
    expect(v1.version).toBe(1);
    expect(v1.content.currency).toBe("GBP");
    expect(v1.content.customer.name).toBe(customerName);
    expect(v1.content.options).toHaveLength(1);
    const frontPrice = v1.content.options[0].machine.fitment[0].price;
    expect(frontPrice).toBe(1500);

    const spec = testTractorSpec();
    spec.axles.front.tyre.price = 9999;
    spec.name = "Renamed after issue";
    const [m] = await db
      .select({ version: machines.version })
      .from(machines)
      .where(eq(machines.id, machineId));
    const patched = await call(patchMachine, team.estimator.cookie, "x", {
      method: "PATCH",
      params: { id: machineId },
      body: { spec, version: m!.version },
    });
    expect(patched.status).toBe(200);
    const again = await call(getVersion, team.estimator.cookie, "x", {
      params: { id, version: "1" },
    });
    expect(again.body.content).toEqual(v1.content);
  });

  it("the database refuses a direct UPDATE of an issued version's content", async () => {
    const { id } = await newIssuedReport();
    // Straight through the pg driver, as a psql session would: no application code involved.
    await expect(
      getPool().query(
        `update report_versions set content = jsonb_set(content, '{title}', '"rewritten"') where report_id = $1`,
        [id],
      ),
    ).rejects.toThrow(/issued and cannot be changed/);
    await expect(
      getPool().query(`update report_versions set engine_version = '9.9.9' where report_id = $1`, [
        id,
      ]),
    ).rejects.toThrow(/cannot be changed/);
    // Marking a version superseded is the one change allowed, and only once.
    await getPool().query(`update report_versions set superseded_at = now() where report_id = $1`, [
      id,
    ]);
    await expect(
      getPool().query(`update report_versions set superseded_at = null where report_id = $1`, [id]),
    ).rejects.toThrow(/cannot be changed/);
    const [row] = await db.select().from(reportVersions).where(eq(reportVersions.reportId, id));
    expect(row!.engineVersion).not.toBe("9.9.9");
  });

  it("re-issuing makes version 2; version 1 stays readable and says it was superseded", async () => {
    const { id } = await newIssuedReport();
    await call(patchReport, team.estimator.cookie, "x", {
      method: "PATCH",
      params: { id },
      body: { recommendations: "Set front pressures from the maker's table before road work." },
    });
    const v2 = await call(issue, team.estimator.cookie, "x", { method: "POST", params: { id } });
    expect(v2.body.version).toBe(2);
    expect(v2.body.content.recommendations).toContain("front pressures");
    const v1 = await call(getVersion, team.estimator.cookie, "x", { params: { id, version: "1" } });
    expect(v1.status).toBe(200);
    expect(v1.body.supersededAt).not.toBeNull();
    expect(v1.body.latestVersion).toBe(2);
    expect(v1.body.content.recommendations).toBe("");
    const list = await call(
      listReports,
      team.estimator.cookie,
      `/api/v1/reports?q=${encodeURIComponent(v2.body.content.title)}`,
    );
    expect(
      list.body.items.map((r: { version: number; status: string }) => [r.version, r.status]),
    ).toEqual([
      [2, "issued"],
      [1, "superseded"],
    ]);
  });

  it("a billing admin or a customer cannot issue; bad input is a 400 that names the field", async () => {
    const { id } = await newIssuedReport();
    expect(
      (await call(issue, team.billing.cookie, "x", { method: "POST", params: { id } })).status,
    ).toBe(403);
    const bad = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
      method: "POST",
      body: { estimateId: "not-an-id" },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors).toHaveProperty("estimateId");
  });
});

describe("sharing and the customer's view", () => {
  it("a customer sees only what was shared with them; opening is recorded; withdrawal hides it", async () => {
    const mine = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    const other = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId: otherCustomerId,
    });
    const unshared = await newIssuedReport();
    const shared = await newIssuedReport();
    const draft = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
      method: "POST",
      body: { estimateId },
    });

    for (const id of [unshared.id, shared.id, draft.body.id])
      expect((await call(getReport, mine.cookie, "x", { params: { id } })).status).toBe(404);

    const since = new Date(Date.now() - 1000);
    const result = await shareReport({
      db,
      mailer,
      actor: team.estimator.actor,
      id: shared.id,
      input: {},
    });
    expect(result.message).toContain(mine.user.email);
    const mail = await waitForMail({ db, to: mine.user.email, since });
    expect(linkFrom(mail, `/reports/${shared.id}`)).toContain(shared.id);

    const listed = await call(listReports, mine.cookie, "/api/v1/reports?pageSize=100");
    expect(listed.body.items.map((r: { reportId: string }) => r.reportId)).toEqual([shared.id]);
    expect((await call(listReports, other.cookie, "/api/v1/reports")).body.total).toBe(0);
    expect((await call(getReport, other.cookie, "x", { params: { id: shared.id } })).status).toBe(
      404,
    );

    const before = await call(getReport, team.estimator.cookie, "x", { params: { id: shared.id } });
    expect(before.body.status).toBe("shared");
    expect(before.body.shares[0].firstOpenedAt).toBeNull();
    const opened = await call(getVersion, mine.cookie, "x", {
      params: { id: shared.id, version: "latest" },
    });
    expect(opened.status).toBe(200);
    const after = await call(getReport, team.estimator.cookie, "x", { params: { id: shared.id } });
    expect(after.body.status).toBe("opened");
    expect(after.body.shares[0].firstOpenedAt).not.toBeNull();
    // The customer's own view carries no share list or draft text.
    const own = await call(getReport, mine.cookie, "x", { params: { id: shared.id } });
    expect(own.body.shares).toEqual([]);

    // A question e-mails the estimator who prepared it; the reply goes back to the customer.
    const asked = new Date(Date.now() - 1000);
    await postReportMessage({
      db,
      mailer,
      actor: mine.actor,
      id: shared.id,
      input: { body: "Would wider rears help?" },
    });
    const question = await waitForMail({ db, to: team.estimator.user.email, since: asked });
    expect(question.text).toContain("Would wider rears help?");
    await postReportMessage({
      db,
      mailer,
      actor: team.estimator.actor,
      id: shared.id,
      input: { body: "Yes, see option 2." },
    });
    const reply = await waitForMail({
      db,
      to: mine.user.email,
      since: asked,
      subjectIncludes: "Reply",
    });
    expect(reply.text).toContain("see option 2");

    await withdrawReportShare({ db, actor: team.estimator.actor, id: shared.id });
    expect((await call(getReport, mine.cookie, "x", { params: { id: shared.id } })).status).toBe(
      404,
    );
    expect((await call(listReports, mine.cookie, "/api/v1/reports")).body.total).toBe(0);
  });

  it("a customer with no account gets an invitation e-mail at the contact address", async () => {
    const [c] = await db
      .execute<{ id: string }>(
        sql`insert into customers (dealership_id, name, contact_email) values (${team.dealershipId}, ${`Nanscawen ${tag}`}, ${`buyer-${tag}@nanscawen.test`}) returning id`,
      )
      .then((r) => r.rows);
    const mId = (
      await call(createMachine, team.admin.cookie, "/api/v1/machines", {
        method: "POST",
        body: { customerId: c!.id, kind: "tractor", spec: testTractorSpec() },
      })
    ).body.id;
    const dc = await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId: c!.id });
    const est = await call(createEstimate, team.estimator.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId: mId, dutyCycleId: dc.id },
    });
    const rep = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
      method: "POST",
      body: { estimateId: est.body.id },
    });
    await call(issue, team.estimator.cookie, "x", { method: "POST", params: { id: rep.body.id } });
    const since = new Date(Date.now() - 1000);
    const res = await shareReport({
      db,
      mailer,
      actor: team.estimator.actor,
      id: rep.body.id,
      input: {},
    });
    expect(res.message).toContain("Invitation");
    const mail = await waitForMail({ db, to: `buyer-${tag}@nanscawen.test`, since });
    expect(linkFrom(mail, "/invite/")).toMatch(/\/invite\/.+/);
    expect(mail.subject).toContain("prepared a tyre report");
  });
});

describe("PDF and CSV annex", () => {
  it("the PDF is valid and its text holds the customer, the key figures, the cautions and the version", async () => {
    const { id, v1 } = await newIssuedReport(`PDF check ${tag}`);
    const res = await getPdf(
      new Request(`${BASE}/x`, { headers: { cookie: team.estimator.cookie } }),
      { params: Promise.resolve({ id, version: "1" }) },
    );
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(
      /attachment; filename="wychwood-farm-[a-z0-9-]+-v1\.pdf"/,
    );
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    const dir = mkdtempSync(join(tmpdir(), "report-pdf-"));
    const file = join(dir, "r.pdf");
    writeFileSync(file, bytes);
    // poppler-utils from Debian: an independent PDF reader, not the library that wrote it.
    const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
    const info = execFileSync("pdfinfo", [file]).toString();
    expect(text).toContain(customerName);
    // Costs per hour under 10 carry a third decimal (Intl.NumberFormat, ECMA-402).
    const perHour = v1.content.options[0].costPerHour;
    const cost = new Intl.NumberFormat("en-GB", {
      style: "currency",
      currency: "GBP",
      minimumFractionDigits: perHour < 10 ? 3 : 2,
      maximumFractionDigits: perHour < 10 ? 3 : 2,
    }).format(perHour);
    expect(text).toContain(cost);
    expect(text).toContain("not warranty");
    expect(text).toMatch(/explosive separation/);
    expect(text).toContain("Assumptions and their sources");
    expect(text).toContain(`Engine version ${v1.content.engineVersion}`);
    const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
    expect(pages).toBeGreaterThanOrEqual(2);
    const ref = `Report ${id.slice(0, 8).toUpperCase()} · version 1`;
    // The id and version and "Page n of N" on every page.
    for (let p = 1; p <= pages; p++) {
      const page = execFileSync("pdftotext", [
        "-f",
        String(p),
        "-l",
        String(p),
        file,
        "-",
      ]).toString();
      expect(page, `page ${p}`).toContain(ref);
      expect(page, `page ${p}`).toContain(`Page ${p} of ${pages}`);
    }
  });

  it("the CSV annex has one row per turn and wheel, with the option first", async () => {
    const { id } = await newIssuedReport();
    const res = await call(getCsv, team.estimator.cookie, "x", { params: { id, version: "1" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const lines = (res.body as string).trim().split(/\r?\n/);
    expect(lines[0]).toMatch(/^option,turn,label,per_hour/);
    expect(lines.length).toBeGreaterThan(4);
    expect(lines[1]).toMatch(/^As fitted today,1,/);
  });
});

describe("logo upload", () => {
  const upload = (cookie: string, body: Uint8Array) =>
    uploadLogoRoute(
      new Request(`${BASE}/api/v1/branding/logo`, {
        method: "POST",
        headers: { cookie, "content-type": "application/octet-stream" },
        body: Buffer.from(body),
      }),
      { params: Promise.resolve({}) },
    );

  it("takes a PNG and stores it re-encoded; the next issue carries it", async () => {
    const png = await sharp({
      create: { width: 1600, height: 400, channels: 3, background: "#2f6b4f" },
    })
      .png()
      .toBuffer();
    const res = await upload(team.admin.cookie, new Uint8Array(png));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({ hasLogo: true, logoWidth: 800, logoHeight: 200 });
    const { v1 } = await newIssuedReport();
    const meta = await sharp(Buffer.from(v1.logo.split(",")[1], "base64")).metadata();
    expect(meta.format).toBe("png");
  });

  it.each([
    [
      "an HTML page named logo.png",
      Buffer.from("<!doctype html><html><script>alert(1)</script></html>"),
    ],
    [
      "an SVG image",
      Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><rect width="9" height="9"/></svg>'),
    ],
    [
      "a PNG signature followed by junk",
      Buffer.concat([
        Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
        Buffer.from("not really"),
      ]),
    ],
  ])("refuses %s and keeps the stored logo", async (_label, bytes) => {
    const res = await upload(team.admin.cookie, new Uint8Array(bytes));
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/PNG or JPEG|damaged/);
    const [row] = await db
      .execute<{ w: number }>(
        sql`select logo_width as w from dealership_brandings where dealership_id = ${team.dealershipId}`,
      )
      .then((r) => r.rows);
    expect(row?.w).toBe(800);
  });

  it("only a dealer admin may change the logo", async () => {
    const res = await upload(team.estimator.cookie, new Uint8Array([0xff, 0xd8, 0xff]));
    expect(res.status).toBe(403);
  });
});
