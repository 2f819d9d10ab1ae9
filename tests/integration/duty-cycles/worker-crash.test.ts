// A worker killed mid-import (SIGKILL, as the out-of-memory killer does): another worker notices
// the stale heartbeat within seconds, the queue retries the job, and the import finishes exactly
// once with the same turns as an uninterrupted import. Real pg-boss, real PostgreSQL, the real
// worker script in a child process.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { count, countDistinct, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { customers, dutyCycleTurns, dutyCycles } from "@/db/schema";
import { getEnv } from "@/lib/env";
import { samplePath } from "@/lib/duty-cycles/synthetic-path";
import { createTestMember } from "@/tests/support/session";
import { POST as upload } from "@/app/api/v1/uploads/route";
import { POST as create } from "@/app/api/v1/duty-cycles/route";
import { GET as getOne } from "@/app/api/v1/duty-cycles/[id]/route";
import { startImportWorker } from "@/features/duty-cycles/server/import-worker";
import { getImportSender, importQueue } from "@/features/duty-cycles/server/import-queue";
import { KNOWN_LEGS, TELEMATICS_MAPPING, callRoute, streamOf, waitFor } from "./support";

// A folder and a queue of this file's own, so other test files' workers never take its jobs.
const uploadDir = mkdtempSync(path.join(tmpdir(), "treadcast-crash-"));
process.env.UPLOAD_DIR = uploadDir;
process.env.IMPORT_QUEUE = `duty-cycle-import-crash-test-${process.pid}`;

const db = getDb();
let estimator: Awaited<ReturnType<typeof createTestMember>>;
let customerId: string;
let child: ChildProcess | undefined;
let rescuer: Awaited<ReturnType<typeof startImportWorker>> | undefined;

/** About 540,000 rows (15 MB): long enough to be caught mid-way. */
function longLog(): string {
  const legs = Array.from({ length: 200 }, () => KNOWN_LEGS).flat();
  const lines = ["time_s,speed_kmh,yaw_dps,ground"];
  for (const s of samplePath({ legs, noise: { yawRate: 0.3 }, seed: 5 }))
    lines.push(`${s.t.toFixed(1)},${(s.speed * 3.6).toFixed(2)},${s.yawRate.toFixed(3)},field`);
  return lines.join("\n") + "\n";
}

function startWorkerProcess(): Promise<ChildProcess> {
  const proc = spawn(
    "node",
    ["--conditions=react-server", "--import", "tsx", "scripts/worker.ts"],
    {
      env: { ...process.env },
      stdio: ["ignore", "pipe", "inherit"],
    },
  );
  return new Promise((resolve, reject) => {
    proc.stdout!.on("data", (d: Buffer) => {
      if (d.toString().includes("waiting for duty-cycle imports")) resolve(proc);
    });
    proc.on("exit", (code) => reject(new Error(`worker exited early (${code})`)));
  });
}

const detail = (id: string) =>
  callRoute(getOne, estimator.cookie, `/api/v1/duty-cycles/${id}`, { params: { id } });

async function importFile(uploadId: string, name: string) {
  const created = await callRoute(create, estimator.cookie, "/api/v1/duty-cycles", {
    method: "POST",
    json: { source: "upload", name, customerId, uploadId, mapping: TELEMATICS_MAPPING },
  });
  expect(created.status).toBe(201);
  return created.body.id as string;
}

beforeAll(async () => {
  expect(getEnv().IMPORT_QUEUE).toBe(process.env.IMPORT_QUEUE);
  estimator = await createTestMember({ db, roles: ["estimator"] });
  const [c] = await db
    .insert(customers)
    .values({ dealershipId: estimator.dealership.id, name: "Crashmoor Farm" })
    .returning();
  customerId = c!.id;
});

afterAll(async () => {
  child?.kill("SIGKILL");
  await rescuer?.stop();
  await (await getImportSender()).stop({ graceful: false, wait: true });
});

describe("a worker killed mid-import", () => {
  it("is noticed, retried, shown as retried, and finishes once with no duplicated turns", async () => {
    const up = await callRoute(upload, estimator.cookie, "/api/v1/uploads", {
      method: "POST",
      body: streamOf(longLog(), 256 * 1024),
      headers: { "x-file-name": "long-shift.csv", "content-type": "text/csv" },
    });
    expect(up.status).toBe(201);

    child = await startWorkerProcess();
    const id = await importFile(up.body.id, "Interrupted shift");
    await waitFor(
      () => db.select().from(dutyCycles).where(eq(dutyCycles.id, id)),
      ([c]) => c?.status === "processing",
      30_000,
    );
    child.kill("SIGKILL");
    await new Promise((r) => child!.once("exit", r));
    child = undefined;
    const [stuck] = await db.select().from(dutyCycles).where(eq(dutyCycles.id, id));
    expect(stuck).toMatchObject({ status: "processing", attempts: 1, interruptions: 0 });
    const [none] = await db
      .select({ n: count() })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, id));
    expect(none!.n).toBe(0);

    // A surviving worker, with the liveness window shortened so the test stays quick.
    const killedAt = Date.now();
    rescuer = await startImportWorker({
      db,
      connectionString: getEnv().DATABASE_URL,
      log: () => undefined,
      // Over two missed beats (they come every 2 s), so a busy machine's slow beat is not a death.
      liveness: { staleAfterSeconds: 5, checkSeconds: 1 },
    });
    const done = await waitFor(
      () => detail(id),
      (r) => r.body.status === "ready" || r.body.status === "failed",
      60_000,
    );
    expect(done.body.status).toBe("ready");
    // Well inside the queue's 15-minute expiry: the heartbeat found it.
    expect(Date.now() - killedAt).toBeLessThan(30_000);
    expect(done.body).toMatchObject({ attempts: 2, interruptions: 1 });

    // The same file imported without interruption is the reference, on a worker with the
    // product's own liveness window.
    await rescuer.stop();
    rescuer = await startImportWorker({
      db,
      connectionString: getEnv().DATABASE_URL,
      log: () => undefined,
    });
    const refId = await importFile(up.body.id, "Uninterrupted shift");
    const ref = await waitFor(
      () => detail(refId),
      (r) => r.body.status === "ready",
      60_000,
    );
    expect(ref.body.interruptions).toBe(0);
    expect(done.body.turnCount).toBe(ref.body.turnCount);
    expect(done.body.turnCount).toBeGreaterThan(100);
    const [stored] = await db
      .select({ n: count(), seqs: countDistinct(dutyCycleTurns.seq) })
      .from(dutyCycleTurns)
      .where(eq(dutyCycleTurns.dutyCycleId, id));
    expect(stored).toEqual({ n: ref.body.turnCount, seqs: ref.body.turnCount });
    expect(done.body.summary).toEqual(ref.body.summary);

    // One job, retried once and completed once.
    const [cycle] = await db.select().from(dutyCycles).where(eq(dutyCycles.id, id));
    const job = await rescuer.boss.getJobById(importQueue(), cycle!.jobId!);
    expect(job).toMatchObject({ state: "completed", retryCount: 1 });
  }, 150_000);
});
