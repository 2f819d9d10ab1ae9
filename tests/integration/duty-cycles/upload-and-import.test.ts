// Upload through the real route handler (streamed body), processing through the real pg-boss
// queue and worker, rows in the real PostgreSQL started by the test command.
import { createHash } from "node:crypto";
import { mkdtempSync, readdirSync, readFileSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { count, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { customers, dutyCycleTurns, dutyCycles, estimates, machines } from "@/db/schema";
import { getEnv } from "@/lib/env";
import { createTestMember } from "@/tests/support/session";
import { POST as upload } from "@/app/api/v1/uploads/route";
import { GET as list, POST as create } from "@/app/api/v1/duty-cycles/route";
import { GET as getOne, DELETE as remove } from "@/app/api/v1/duty-cycles/[id]/route";
import { POST as retry } from "@/app/api/v1/duty-cycles/[id]/retry/route";
import { GET as badRows } from "@/app/api/v1/duty-cycles/[id]/bad-rows/route";
import { samplePath } from "@/lib/duty-cycles/synthetic-path";
import { startImportWorker } from "@/features/duty-cycles/server/import-worker";
import { getImportSender } from "@/features/duty-cycles/server/import-queue";
import { runImport } from "@/features/duty-cycles/server/run-import";
import { createDutyCycle } from "@/features/duty-cycles/server/create-duty-cycle";
import {
  KNOWN_LEGS,
  KNOWN_TURNS,
  TELEMATICS_MAPPING,
  callRoute,
  knownTelematicsCsv,
  streamOf,
  waitFor,
} from "./support";

// Before the env module is first read: a private upload folder and a small limit for the 413 check.
const uploadDir = mkdtempSync(path.join(tmpdir(), "treadcast-uploads-"));
process.env.UPLOAD_DIR = uploadDir;
process.env.UPLOAD_LIMIT_BYTES = String(2 * 1024 * 1024);

const db = getDb();
let worker: Awaited<ReturnType<typeof startImportWorker>>;
let estimator: Awaited<ReturnType<typeof createTestMember>>;
let outsider: Awaited<ReturnType<typeof createTestMember>>;
let customerId: string;

beforeAll(async () => {
  expect(getEnv().UPLOAD_DIR).toBe(uploadDir);
  estimator = await createTestMember({ db, roles: ["estimator"] });
  outsider = await createTestMember({ db, roles: ["dealer_admin"] });
  const [c] = await db
    .insert(customers)
    .values({ dealershipId: estimator.dealership.id, name: "Wrexley Bottom Farm" })
    .returning();
  customerId = c!.id;
  worker = await startImportWorker({
    db,
    connectionString: getEnv().DATABASE_URL,
    log: () => undefined,
  });
});

afterAll(async () => {
  await worker?.stop();
  await (await getImportSender()).stop({ graceful: false, wait: true });
});

async function uploadText(text: string, name = "log.csv") {
  return callRoute(upload, estimator.cookie, "/api/v1/uploads", {
    method: "POST",
    body: streamOf(text),
    headers: { "x-file-name": name, "content-type": "text/csv" },
  });
}

async function importUpload(uploadId: string, name: string) {
  const created = await callRoute(create, estimator.cookie, "/api/v1/duty-cycles", {
    method: "POST",
    json: { source: "upload", name, customerId, uploadId, mapping: TELEMATICS_MAPPING },
  });
  expect(created.status).toBe(201);
  return created.body.id as string;
}

const detail = (id: string, cookie = estimator.cookie) =>
  callRoute(getOne, cookie, `/api/v1/duty-cycles/${id}`, { params: { id } });

describe("duty-cycle upload and import", () => {
  let readyId: string;

  it("streams the upload to storage with its sha256 and size, then the worker stores the turns", async () => {
    const formula = "=SUM(A1:A9)";
    const { csv, rows } = knownTelematicsCsv([
      `abc,10,0,field`, // time not a number
      `${formula},10,0,field`, // formula in a bad cell: must be neutralised in the download
    ]);
    const up = await uploadText(csv);
    expect(up.status).toBe(201);
    expect(up.body.sizeBytes).toBe(Buffer.byteLength(csv));
    expect(up.body.sha256).toBe(createHash("sha256").update(csv).digest("hex"));
    const stored = readdirSync(path.join(uploadDir, estimator.dealership.id));
    expect(stored).toHaveLength(1);
    expect(readFileSync(path.join(uploadDir, estimator.dealership.id, stored[0]!), "utf8")).toBe(
      csv,
    );

    readyId = await importUpload(up.body.id, "Wrexley drilling log");
    const ready = await waitFor(
      () => detail(readyId),
      (r) => r.body.status === "ready" || r.body.status === "failed",
    );
    expect(ready.body.failureReason).toBeNull();
    expect(ready.body.status).toBe("ready");
    expect(ready.body.turnCount).toBe(KNOWN_TURNS);
    expect(ready.body.rowsUsed).toBe(rows);
    expect(ready.body.rowsSkipped).toBe(2);
    expect(ready.body.progress).toBe(1);
    expect(ready.body.summary.turnsPerHour).toBeGreaterThan(0);
    expect(ready.body.upload.sha256).toBe(up.body.sha256);
    const [n] = await db
      .select({ n: count() })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, readyId));
    expect(n!.n).toBe(KNOWN_TURNS);
    const radii = ready.body.turns.map((t: { radius: number }) => t.radius);
    expect(radii.filter((r: number) => r > 5 && r < 7)).toHaveLength(4);
  });

  it("lists the bad rows with line, column and reason, formulas neutralised", async () => {
    const res = await callRoute(
      badRows,
      estimator.cookie,
      `/api/v1/duty-cycles/${readyId}/bad-rows`,
      {
        params: { id: readyId },
      },
    );
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const lines = (res.body as string).trim().split("\r\n");
    expect(lines[0]).toBe("line,column,reason,value");
    expect(lines).toHaveLength(3);
    expect(lines[1]).toMatch(/^\d+,time_s,is not a time in the chosen unit,abc$/);
    // The formula cell comes back starting with an apostrophe: text, not a formula.
    expect(lines[2]).toMatch(/^\d+,time_s,is not a time in the chosen unit,'=SUM\(A1:A9\)$/);
  });

  it("re-running an import (a retry after a crash) replaces rows and never duplicates them", async () => {
    await db.update(dutyCycles).set({ status: "processing" }).where(eq(dutyCycles.id, readyId));
    expect(await runImport({ db, dutyCycleId: readyId })).toBe("ready");
    expect(await runImport({ db, dutyCycleId: readyId })).toBe("skipped");
    const [n] = await db
      .select({ n: count() })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, readyId));
    expect(n!.n).toBe(KNOWN_TURNS);
  });

  it("answers 413 with the limit over UPLOAD_LIMIT_BYTES, and keeps nothing", async () => {
    const before = readdirSync(path.join(uploadDir, estimator.dealership.id)).length;
    const big = "t,v\n" + "1,2\n".repeat(700_000); // about 2.8 MB, sent without a length
    const res = await uploadText(big, "huge.csv");
    expect(res.status).toBe(413);
    expect(res.body.error.message).toContain("2 MB");
    expect(readdirSync(path.join(uploadDir, estimator.dealership.id))).toHaveLength(before);
    const declared = await callRoute(upload, estimator.cookie, "/api/v1/uploads", {
      method: "POST",
      body: "x",
      headers: { "content-length": String(3 * 1024 * 1024) },
    });
    expect(declared.status).toBe(413);
  });

  it.each([
    ["an empty file", "", "content_empty"],
    ["an HTML page", "<!DOCTYPE html><html><body>Sign in</body></html>", "content_html"],
    ["a binary file", "PK\u0003\u0004\u0000\u0000\u0000binary", "content_binary"],
  ])("refuses %s with a clear error and stores nothing", async (_what, text, code) => {
    const res = await uploadText(text);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe(code);
  });

  it("fails a file with no usable rows, keeps the reason and the bad rows, and can be retried", async () => {
    const up = await uploadText("time_s,speed_kmh,yaw_dps,ground\nx,1,0,field\ny,1,0,field\n");
    expect(up.status).toBe(201);
    const id = await importUpload(up.body.id, "Broken export");
    const failed = await waitFor(
      () => detail(id),
      (r) => r.body.status === "failed",
    );
    expect(failed.body.failureReason).toMatch(/no usable rows/);
    expect(failed.body.turnCount).toBe(0);
    expect(failed.body.rowsSkipped).toBe(2);
    const again = await callRoute(retry, estimator.cookie, `/api/v1/duty-cycles/${id}/retry`, {
      method: "POST",
      params: { id },
    });
    expect(again.status).toBe(202);
    expect(again.body.status).toBe("pending");
    const refailed = await waitFor(
      () => detail(id),
      (r) => r.body.status === "failed" && r.body.attempts === 2,
    );
    expect(refailed.body.failureReason).toMatch(/no usable rows/);
  });

  it("marks the duty cycle failed, with a reason, when the queue cannot take the job", async () => {
    const up = await uploadText(knownTelematicsCsv().csv);
    const row = await createDutyCycle({
      db,
      actor: estimator.actor,
      input: {
        source: "upload",
        name: "Queue down",
        customerId,
        uploadId: up.body.id,
        mapping: TELEMATICS_MAPPING,
      },
      enqueue: async () => {
        throw new Error("connection refused");
      },
    });
    expect(row.status).toBe("failed");
    const got = await detail(row.id);
    expect(got.body.failureReason).toMatch(/could not be queued \(connection refused\)/);
  });

  it("keeps other dealerships out and checks roles", async () => {
    expect((await detail(readyId, outsider.cookie)).status).toBe(404);
    const listed = await callRoute(list, outsider.cookie, "/api/v1/duty-cycles");
    expect(listed.body.items.map((r: { id: string }) => r.id)).not.toContain(readyId);
    const customer = await createTestMember({
      db,
      roles: ["customer"],
      dealershipId: estimator.dealership.id,
    });
    const refused = await callRoute(upload, customer.cookie, "/api/v1/uploads", {
      method: "POST",
      body: "a,b\n1,2\n",
    });
    expect(refused.status).toBe(403);
    expect(
      (await callRoute(upload, null, "/api/v1/uploads", { method: "POST", body: "a" })).status,
    ).toBe(401);
  });

  it("lists with paging, sorting and filters", async () => {
    const res = await callRoute(
      list,
      estimator.cookie,
      "/api/v1/duty-cycles?status=ready&sort=name&dir=asc&pageSize=1",
    );
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ page: 1, pageSize: 1, total: 1 });
    expect(res.body.items[0].id).toBe(readyId);
    const bad = await callRoute(list, estimator.cookie, "/api/v1/duty-cycles?pageSize=1000");
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toContain("pageSize");
  });

  it("deletes only when confirmed and unused, and removes the uploaded file", async () => {
    const noConfirm = await callRoute(remove, estimator.cookie, `/api/v1/duty-cycles/${readyId}`, {
      method: "DELETE",
      params: { id: readyId },
    });
    expect(noConfirm.status).toBe(400);
    const [machine] = await db
      .insert(machines)
      .values({
        dealershipId: estimator.dealership.id,
        name: "Test tractor",
        kind: "tractor",
        spec: {},
      })
      .returning();
    const [estimate] = await db
      .insert(estimates)
      .values({
        dealershipId: estimator.dealership.id,
        machineId: machine!.id,
        dutyCycleId: readyId,
        title: "Uses the cycle",
        machineVersion: 1,
        engineVersion: "test",
        inputs: {},
        result: {},
      })
      .returning();
    const inUse = await callRoute(
      remove,
      estimator.cookie,
      `/api/v1/duty-cycles/${readyId}?confirm=true`,
      {
        method: "DELETE",
        params: { id: readyId },
      },
    );
    expect(inUse.status).toBe(409);
    expect(inUse.body.error.message).toContain("1 estimate");
    await db.delete(estimates).where(eq(estimates.id, estimate!.id));
    const storedBefore = readdirSync(path.join(uploadDir, estimator.dealership.id));
    const gone = await callRoute(
      remove,
      estimator.cookie,
      `/api/v1/duty-cycles/${readyId}?confirm=true`,
      {
        method: "DELETE",
        params: { id: readyId },
      },
    );
    expect(gone.status).toBe(200);
    expect((await detail(readyId)).status).toBe(404);
    const storedAfter = readdirSync(path.join(uploadDir, estimator.dealership.id));
    expect(storedAfter.length).toBe(storedBefore.length - 1);
    const [left] = await db
      .select({ n: count() })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, readyId));
    expect(left!.n).toBe(0);
    expect(existsSync(uploadDir)).toBe(true);
  });

  it("imports a Windows-1252 export with German names and ground words (Grünland)", async () => {
    // The known log as a German Windows export: semicolons, decimal commas, single-byte ü (0xFC).
    const samples = samplePath({ legs: KNOWN_LEGS, noise: { yawRate: 0.3 }, seed: 21 });
    const comma = (x: number, digits: number) => x.toFixed(digits).replace(".", ",");
    const german =
      ["Zeit;Geschwindigkeit (km/h);Gierrate;Untergrund"]
        .concat(
          samples.map(
            (p) => `${comma(p.t, 1)};${comma(p.speed * 3.6, 2)};${comma(p.yawRate, 3)};Grünland`,
          ),
        )
        .join("\r\n") + "\r\n";
    const bytes = Buffer.from(german, "latin1");
    expect(bytes.includes(0xfc)).toBe(true);
    const up = await callRoute(upload, estimator.cookie, "/api/v1/uploads", {
      method: "POST",
      body: new ReadableStream({
        start(controller) {
          controller.enqueue(new Uint8Array(bytes));
          controller.close();
        },
      }),
      headers: { "x-file-name": "schlag-7.csv", "content-type": "text/csv" },
    });
    expect(up.status).toBe(201);
    const created = await callRoute(create, estimator.cookie, "/api/v1/duty-cycles", {
      method: "POST",
      json: {
        source: "upload",
        name: "Schlag 7",
        customerId,
        uploadId: up.body.id,
        mapping: { ...TELEMATICS_MAPPING, delimiter: ";", decimal: ",", encoding: "latin1" },
      },
    });
    expect(created.status).toBe(201);
    const ready = await waitFor(
      () => detail(created.body.id),
      (r) => r.body.status === "ready" || r.body.status === "failed",
    );
    expect(ready.body.status).toBe("ready");
    expect(ready.body.turnCount).toBe(KNOWN_TURNS);
    expect(ready.body.turns.every((t: { surface: string }) => t.surface === "grass")).toBe(true);
  });
});
