// The reports list (GET /api/v1/reports): one row per issued version plus drafts, with status,
// filters and paging, through the real route on PostgreSQL, in a dealership of its own so the
// counts are exact.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getPool } from "@/db/client";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { GET as listReports, POST as createReport } from "@/app/api/v1/reports/route";
import { POST as issue } from "@/app/api/v1/reports/[id]/issue/route";
import { createMailer } from "@/features/auth/server/mailer";
import { shareReport } from "@/features/reports/server/share-report";
import { startSmtpFake } from "@/mocks/mail/smtp-fake";
import { uniqueTag } from "@/tests/support/session";
import {
  call,
  db,
  insertReadyDutyCycle,
  makeDealership,
  testTractorSpec,
} from "@/tests/support/records";

type TRow = { reportId: string; version: number | null; status: string; customerId: string };

let team: Awaited<ReturnType<typeof makeDealership>>;
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;
const customers: { id: string; estimateId: string }[] = [];

beforeAll(async () => {
  smtp = await startSmtpFake({ port: 0 });
  team = await makeDealership();
  for (const name of ["Polwithen", "Boscawen"]) {
    const id = (
      await call(createCustomer, team.admin.cookie, "/api/v1/customers", {
        method: "POST",
        body: { name: `${name} ${uniqueTag()}`, contactEmail: `${uniqueTag()}@${name}.test` },
      })
    ).body.id as string;
    const machineId = (
      await call(createMachine, team.admin.cookie, "/api/v1/machines", {
        method: "POST",
        body: { customerId: id, kind: "tractor", spec: testTractorSpec() },
      })
    ).body.id;
    const dc = await insertReadyDutyCycle({ dealershipId: team.dealershipId, customerId: id });
    const est = await call(createEstimate, team.estimator.cookie, "/api/v1/estimates", {
      method: "POST",
      body: { machineId, dutyCycleId: dc.id },
    });
    customers.push({ id, estimateId: est.body.id });
  }
  const draft = async (estimateId: string) =>
    (
      await call(createReport, team.estimator.cookie, "/api/v1/reports", {
        method: "POST",
        body: { estimateId },
      })
    ).body.id as string;
  const issueIt = (id: string) =>
    call(issue, team.estimator.cookie, "x", { method: "POST", params: { id } });
  const [a, b] = customers as [(typeof customers)[0], (typeof customers)[0]];
  // First customer: a draft, and a report issued twice (v1 superseded, v2 issued).
  await draft(a.estimateId);
  const twice = await draft(a.estimateId);
  await issueIt(twice);
  await issueIt(twice);
  // Second customer: one issued and shared (no account yet, so the contact is invited).
  const shared = await draft(b.estimateId);
  await issueIt(shared);
  const mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "t <t@example.test>" });
  await shareReport({ db, mailer, actor: team.estimator.actor, id: shared, input: {} });
});
afterAll(async () => {
  await smtp.stop();
  await getPool().end();
});

const list = async (query: string) => {
  const res = await call(listReports, team.estimator.cookie, `/api/v1/reports?${query}`);
  return res as { status: number; body: { items: TRow[]; total: number; pageCount: number } };
};

describe("reports list", () => {
  it("lists drafts and every issued version with its status", async () => {
    const all = await list("pageSize=100");
    expect(all.body.total).toBe(4);
    expect(all.body.items.map((r) => r.status).sort()).toEqual([
      "draft",
      "issued",
      "shared",
      "superseded",
    ]);
  });

  it.each([
    ["draft", 1],
    ["issued", 1],
    ["shared", 1],
    ["superseded", 1],
    ["opened", 0],
  ])("filters by status %s", async (status, n) => {
    const res = await list(`status=${status}`);
    expect(res.body.total).toBe(n);
    expect(res.body.items.every((r) => r.status === status)).toBe(true);
  });

  it("filters by customer and pages", async () => {
    const first = customers[0]!.id;
    const mine = await list(`customerId=${first}`);
    expect(mine.body.total).toBe(3);
    expect(mine.body.items.every((r) => r.customerId === first)).toBe(true);
    const p1 = await list("pageSize=3&page=1");
    const p2 = await list("pageSize=3&page=2");
    expect([p1.body.items.length, p2.body.items.length, p2.body.pageCount]).toEqual([3, 1, 2]);
    const keys = [...p1.body.items, ...p2.body.items].map((r) => `${r.reportId}/${r.version}`);
    expect(new Set(keys).size).toBe(4);
  });

  it("an unknown status is a 400 that names the field", async () => {
    const res = await list("status=archived");
    expect(res.status).toBe(400);
    expect(res.body).toHaveProperty("error.fieldErrors.status");
  });
});
