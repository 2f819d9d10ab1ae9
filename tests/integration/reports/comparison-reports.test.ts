// Quote reports built from a stored comparison, through the real route handlers on PostgreSQL:
// the draft records its source, issuing freezes every option with its payback, reasons and
// cautions, the PDF and the CSV annex carry all of them, and who may create one from what.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { getPool } from "@/db/client";
import { paybackOf } from "@/lib/reports";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { POST as createComparison } from "@/app/api/v1/comparisons/route";
import { GET as getComparison } from "@/app/api/v1/comparisons/[id]/route";
import { POST as createReport } from "@/app/api/v1/reports/route";
import { GET as getReport } from "@/app/api/v1/reports/[id]/route";
import { POST as issue } from "@/app/api/v1/reports/[id]/issue/route";
import { GET as getVersion } from "@/app/api/v1/reports/[id]/versions/[version]/route";
import { GET as getPdf } from "@/app/api/v1/reports/[id]/versions/[version]/pdf/route";
import { GET as getCsv } from "@/app/api/v1/reports/[id]/versions/[version]/csv/route";
import { PUT as putBranding } from "@/app/api/v1/branding/route";
import { createMailer } from "@/features/auth/server/mailer";
import { shareReport } from "@/features/reports/server/share-report";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";
import { createTestMember, uniqueTag } from "@/tests/support/session";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
  BASE,
} from "@/tests/support/records";

const tag = uniqueTag();
const customerName = `Penhallow Farm ${tag}`;
/** Three changes a dealer might price (invented). With the machine as fitted: four options. */
const OPTIONS = [
  {
    name: "Parallel linkage",
    changes: [{ kind: "steering", steering: { layout: "parallel", maxLock: 50 } }],
    oneOffCost: 0,
  },
  {
    name: "Steering arms re-set to 20°",
    changes: [{ kind: "parameter", parameter: "armAngle", value: 20 }],
    oneOffCost: 350,
  },
  {
    name: "Wider front track",
    changes: [{ kind: "parameter", parameter: "frontTrack", value: 2 }],
    oneOffCost: 650,
  },
];

type TOutcome = {
  name: string;
  costPerHour: number;
  savingPerHour: number;
  paybackHours: number | null;
  reasons: string[];
  cautions: { code: string }[];
};

let team: Awaited<ReturnType<typeof makeDealership>>;
let other: Awaited<ReturnType<typeof makeDealership>>;
let customerId: string;
let comparisonId: string;
let comparison: { result: { current: TOutcome; options: TOutcome[] } };
let otherComparisonId: string;
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;

async function comparisonFor(t: typeof team, name: string) {
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, t.admin.cookie, path, { method: "POST", body });
  const customer = (
    await post(createCustomer, "/api/v1/customers", {
      name,
      contactName: "Kerensa Polglase",
      contactEmail: `kerensa-${uniqueTag()}@penhallow.test`,
    })
  ).body.id as string;
  const machine = (
    await post(createMachine, "/api/v1/machines", {
      customerId: customer,
      kind: "tractor",
      spec: testTractorSpec(),
    })
  ).body.id;
  const dutyCycle = (
    await insertReadyDutyCycle({ dealershipId: t.dealershipId, customerId: customer })
  ).id;
  const estimate = await call(createEstimate, t.estimator.cookie, "/api/v1/estimates", {
    method: "POST",
    body: { machineId: machine, dutyCycleId: dutyCycle },
  });
  const created = await call(createComparison, t.estimator.cookie, "/api/v1/comparisons", {
    method: "POST",
    body: { estimateId: estimate.body.id, options: OPTIONS, hours: 2000 },
  });
  expect(created.status).toBe(201);
  return { customer, comparison: created.body };
}

beforeAll(async () => {
  smtp = await startSmtpFake({ port: 0 });
  team = await makeDealership();
  other = await makeDealership();
  const mine = await comparisonFor(team, customerName);
  customerId = mine.customer;
  comparisonId = mine.comparison.id;
  comparison = mine.comparison;
  otherComparisonId = (await comparisonFor(other, `Trewartha ${tag}`)).comparison.id;
  await call(putBranding, team.admin.cookie, "/api/v1/branding", {
    method: "PUT",
    body: { currency: "GBP" },
  });
});
afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

async function issuedFromComparison() {
  const created = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
    method: "POST",
    body: { comparisonId },
  });
  expect(created.status).toBe(201);
  const id = created.body.id as string;
  const issued = await call(issue, team.estimator.cookie, "x", { method: "POST", params: { id } });
  expect(issued.status).toBe(201);
  return { id, draft: created.body, v1: issued.body };
}

describe("a report from a stored comparison", () => {
  it("records the comparison as the draft's source", async () => {
    const { draft } = await issuedFromComparison();
    expect(draft).toMatchObject({
      sourceKind: "comparison",
      comparisonId,
      estimateId: null,
      customerId,
      customerName,
      status: "draft",
      latestVersion: 0,
    });
    expect(draft.title).toContain("Test row-crop tractor");
    const read = await call(getReport, team.estimator.cookie, "x", { params: { id: draft.id } });
    expect(read.body.comparisonId).toBe(comparisonId);
  });

  it("a comparison of a calibrated estimate issues with the calibration's figures and says so", async () => {
    const { estimates } = await import("@/db/schema");
    const { eq } = await import("drizzle-orm");
    const { ENGINE_COEFFICIENTS } = await import("@/lib/scrub");
    const stored = await call(getComparison, team.estimator.cookie, "x", {
      params: { id: comparisonId },
    });
    const [est] = await db
      .select()
      .from(estimates)
      .where(eq(estimates.id, stored.body.estimateId as string));
    // As features/calibration stores a calibrated estimate: scaled options and the fit behind them.
    const calibration = {
      source: "machine",
      multipliers: { base: 1.5, scrub: 0.7 },
      r2: 0.88,
      n: 18,
      hoursCovered: 420,
    };
    const { id: _id, createdAt: _c, ...copy } = est!;
    const [calibrated] = await db
      .insert(estimates)
      .values({
        ...copy,
        title: `${est!.title} · calibrated`,
        inputs: {
          ...(est!.inputs as object),
          options: {
            baseWearPerKm: ENGINE_COEFFICIENTS.BASE_WEAR_MM_PER_KM * 1.5,
            abradability: ENGINE_COEFFICIENTS.ABRADABILITY * 0.7,
          },
          calibration,
        },
      })
      .returning({ id: estimates.id });
    const cmp = await call(createComparison, team.estimator.cookie, "/api/v1/comparisons", {
      method: "POST",
      body: { estimateId: calibrated!.id, options: OPTIONS, hours: 2000 },
    });
    expect(cmp.status).toBe(201);
    expect(cmp.body.result.current.costPerHour).not.toBeCloseTo(
      comparison.result.current.costPerHour,
      6,
    );
    const created = await call(createReport, team.estimator.cookie, "/api/v1/reports", {
      method: "POST",
      body: { comparisonId: cmp.body.id },
    });
    const id = created.body.id as string;
    const issued = await call(issue, team.estimator.cookie, "x", {
      method: "POST",
      params: { id },
    });
    expect(issued.status).toBe(201);
    const c = issued.body.content;
    expect(c.options[0].costPerHour).toBeCloseTo(cmp.body.result.current.costPerHour, 9);
    const note = c.assumptions.find((a: { topic: string }) => a.topic === "Calibration");
    expect(note.text).toContain("calibrated from 18 of this machine's tread readings");
  });

  it("issuing freezes the machine as fitted and every option with its payback, reasons and cautions", async () => {
    const { v1 } = await issuedFromComparison();
    const c = v1.content;
    expect(c.kind).toBe("comparison");
    expect(c.currency).toBe("GBP");
    expect(c.customer.name).toBe(customerName);
    expect(c.options.map((o: { label: string }) => o.label)).toEqual([
      "As fitted today",
      ...OPTIONS.map((o) => o.name),
    ]);
    const [baseline, ...priced] = c.options;
    expect(baseline.baseline).toBe(true);
    expect(baseline.costPerHour).toBeCloseTo(comparison.result.current.costPerHour, 9);
    priced.forEach(
      (
        o: TOutcome & {
          label: string;
          oneOffCost: number;
          result: { turns: unknown[] };
          machine: { tracks: { front: number } };
        },
        i: number,
      ) => {
        const stored = comparison.result.options[i]!;
        expect(o.oneOffCost).toBe(OPTIONS[i]!.oneOffCost);
        expect(o.costPerHour).toBeCloseTo(stored.costPerHour, 9);
        expect(o.savingPerHour).toBeCloseTo(stored.savingPerHour, 9);
        // Payback as the comparison computed it; simple payback (common practice, no source).
        if (stored.paybackHours === null) expect(o.paybackHours).toBeNull();
        else expect(o.paybackHours).toBeCloseTo(stored.paybackHours, 6);
        expect(o.paybackHours).toEqual(paybackOf(o.oneOffCost, o.savingPerHour!));
        expect(o.reasons).toEqual(stored.reasons);
        expect(o.cautions).toEqual(stored.cautions);
        // Per-turn detail for the annex, which the stored comparison does not keep.
        expect(o.result.turns.length).toBeGreaterThan(0);
      },
    );
    // The wider track is frozen into that option's machine, with the track caution beside it.
    expect(priced[2].machine.tracks.front).toBe(2);
    expect(priced[2].cautions.map((x: { code: string }) => x.code)).toContain("option-track");
    expect(c.recommendedKey).toBe(
      [...c.options].sort(
        (a: { costPerHour: number }, b: { costPerHour: number }) => a.costPerHour - b.costPerHour,
      )[0].key,
    );
    expect(c.cautions.length).toBeGreaterThan(0);
  });

  it("the PDF carries every option with its payback, and the CSV annex has rows for each", async () => {
    const { id, v1 } = await issuedFromComparison();
    const res = await getPdf(
      new Request(`${BASE}/x`, { headers: { cookie: team.estimator.cookie } }),
      { params: Promise.resolve({ id, version: "1" }) },
    );
    expect(res.status).toBe(200);
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    const file = join(mkdtempSync(join(tmpdir(), "comparison-pdf-")), "r.pdf");
    writeFileSync(file, bytes);
    // poppler's pdftotext: an independent reader of what was written.
    const text = execFileSync("pdftotext", [file, "-"]).toString().replace(/\s+/g, " ");
    expect(text).toContain(customerName);
    // Costs per hour under 10 carry a third decimal, so options a fraction of a penny apart differ.
    const gbp = (v: number) =>
      new Intl.NumberFormat("en-GB", {
        style: "currency",
        currency: "GBP",
        minimumFractionDigits: v < 10 ? 3 : 2,
        maximumFractionDigits: v < 10 ? 3 : 2,
      }).format(v);
    for (const o of v1.content.options as (TOutcome & {
      label: string;
      baseline: boolean;
      paybackHours: number | null;
    })[]) {
      expect(text).toContain(o.label);
      expect(text).toContain(`${gbp(o.costPerHour)}/h`);
      if (!o.baseline && o.paybackHours !== null)
        expect(text).toContain(`${Math.round(o.paybackHours).toLocaleString("en-GB")} h`);
    }
    expect(text).toContain("Before making this change");
    expect(text).toContain("Tyre cost per operating hour (GBP/h)");

    const csv = await call(getCsv, team.estimator.cookie, "x", { params: { id, version: "1" } });
    const lines = (csv.body as string).trim().split(/\r?\n/);
    for (const name of ["As fitted today", ...OPTIONS.map((o) => o.name)])
      expect(lines.some((l) => l.startsWith(`${name},`) || l.startsWith(`"${name}",`))).toBe(true);
  });

  it("a customer never reads the comparison itself, only the report shared with them, with every option", async () => {
    const customer = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    const { id } = await issuedFromComparison();
    expect(
      (await call(getComparison, customer.cookie, "x", { params: { id: comparisonId } })).status,
    ).toBe(404);
    expect(
      (await call(getVersion, customer.cookie, "x", { params: { id, version: "latest" } })).status,
    ).toBe(404);
    const mailer = createMailer({
      host: "127.0.0.1",
      port: smtp.port,
      from: "Treadcast <t@example.test>",
    });
    await shareReport({ db, mailer, actor: team.estimator.actor, id, input: {} });
    const seen = await call(getVersion, customer.cookie, "x", {
      params: { id, version: "latest" },
    });
    expect(seen.status).toBe(200);
    expect(seen.body.content.options).toHaveLength(OPTIONS.length + 1);
    // The customer's copy of the report does not say which stored comparison it came from.
    const own = await call(getReport, customer.cookie, "x", { params: { id } });
    expect(own.body.comparisonId).toBeNull();
  });
});

describe("creating a report: who and from what", () => {
  const create = (cookie: string, body: unknown) =>
    call(createReport, cookie, "/api/v1/reports", { method: "POST", body });

  it("both ids or neither is a 400 that names the field", async () => {
    const both = await create(team.estimator.cookie, {
      comparisonId,
      estimateId: "00000000-0000-4000-8000-000000000000",
    });
    expect(both.status).toBe(400);
    expect(Object.keys(both.body.error.fieldErrors)).toEqual(["comparisonId"]);
    expect(both.body.error.message).toMatch(/comparisonId: .*not both/);

    const none = await create(team.estimator.cookie, { title: "No source" });
    expect(none.status).toBe(400);
    expect(Object.keys(none.body.error.fieldErrors).sort()).toEqual(["comparisonId", "estimateId"]);

    const malformed = await create(team.estimator.cookie, { comparisonId: "not-an-id" });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fieldErrors.comparisonId[0]).toMatch(
      /id of one of your comparisons/,
    );
  });

  it("another dealership's comparison answers 404, and nothing is created", async () => {
    const res = await create(team.estimator.cookie, { comparisonId: otherComparisonId });
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain("No comparison with that id");
    const { rows } = await getPool().query(
      "select count(*)::int as n from reports where comparison_id = $1",
      [otherComparisonId],
    );
    expect(rows[0].n).toBe(0);
  });

  it("a customer account or a billing admin cannot create a report", async () => {
    const customer = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: team.dealershipId,
      customerId,
    });
    expect((await create(customer.cookie, { comparisonId })).status).toBe(403);
    expect((await create(team.billing.cookie, { comparisonId })).status).toBe(403);
  });
});
