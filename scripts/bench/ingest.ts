// npm run bench:ingest: ingest speed and memory on a seeded one-million-row telematics log.
// Prints papaparse's bare parse time, our parse + segment time, the full upload-to-stored-turns
// time (upload verb -> pg-boss -> worker process -> PostgreSQL) and the worker's peak RSS.
// Needs the dev PostgreSQL cluster; it recreates its own "treadcast_bench_ingest" database there.
import { execFileSync, spawn } from "node:child_process";
import { rm } from "node:fs/promises";
import { createReadStream, existsSync, readFileSync, statSync } from "node:fs";
import { Readable } from "node:stream";
import os from "node:os";
import Papa from "papaparse";
import { eq } from "drizzle-orm";
import { BENCH_MAPPING } from "./ingest-mapping";

const ROWS = Number(process.env.BENCH_ROWS ?? 1_000_000);
const FILE = `var/bench/ingest-${ROWS}.csv`;
// A database of its own, dropped and recreated by each run: never the one DATABASE_URL names.
const benchDb = new URL(
  process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:54329/treadcast",
);
benchDb.pathname = "/treadcast_bench_ingest";
process.env.DATABASE_URL = benchDb.toString();
// Always a folder of its own: the run deletes it afterwards.
process.env.UPLOAD_DIR = "var/bench/uploads";
process.env.UPLOAD_LIMIT_BYTES ??= String(200 * 1024 * 1024);

const ms = (t0: bigint) => Number(process.hrtime.bigint() - t0) / 1e6;

function generate() {
  if (existsSync(FILE)) return;
  execFileSync("node_modules/.bin/tsx", ["scripts/bench/ingest-generate.ts", FILE, String(ROWS)], {
    stdio: "inherit",
  });
}

/**
 * papaparse alone, as a plain reader of this file would call it: the same stream (UTF-8,
 * 256 KiB reads) and the same parse settings as readCsvRows (delimiter and line ending given,
 * no header, no dynamicTyping, records as arrays through `chunk`; papaparse takes its own fast
 * path for chunks without quotes), records dropped.
 */
function bareParse(): Promise<number> {
  return new Promise((resolve, reject) => {
    let n = 0;
    Papa.parse<string[]>(
      createReadStream(FILE, { encoding: "utf8", highWaterMark: 256 * 1024 }) as unknown as File,
      {
        delimiter: ",",
        newline: "\n",
        chunk: (r) => {
          n += r.data.length;
        },
        complete: () => resolve(n),
        error: reject,
      },
    );
  });
}

async function ourParse() {
  const { readCsvRows } = await import("@/features/duty-cycles/server/read-csv-rows");
  const { createTelematicsImporter } = await import("@/lib/duty-cycles/telematics-import");
  const importer = createTelematicsImporter(BENCH_MAPPING);
  await readCsvRows({
    input: createReadStream(FILE, { encoding: "utf8", highWaterMark: 256 * 1024 }),
    delimiter: ",",
    hasHeader: true,
    onRecord: importer.pushRow,
  });
  return importer.finish();
}

/**
 * Best wall time and best process CPU time (user + system) of each contender over `runs`
 * rounds, taking turns (a, b, a, b, ...) so a change of load on the shared box hits both alike.
 * CPU time is the steadier figure when the box is busy.
 */
async function bestOfEach(runs: number, contenders: [string, () => Promise<unknown>][]) {
  const best = contenders.map(() => ({ wall: Infinity, cpu: Infinity }));
  for (let i = 0; i < runs; i++) {
    for (const [k, [, f]] of contenders.entries()) {
      const c0 = process.cpuUsage();
      const t0 = process.hrtime.bigint();
      await f();
      best[k]!.wall = Math.min(best[k]!.wall, ms(t0));
      const c = process.cpuUsage(c0);
      best[k]!.cpu = Math.min(best[k]!.cpu, (c.user + c.system) / 1000);
    }
  }
  contenders.forEach(([label], k) =>
    console.log(
      `${label.padEnd(44)} ${(best[k]!.wall / 1000).toFixed(2)} s wall, ${(best[k]!.cpu / 1000).toFixed(2)} s CPU (best of ${runs}, taking turns)`,
    ),
  );
  return best;
}

/** CPU seconds a process has used so far (utime + stime from /proc, in clock ticks of 10 ms). */
function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]!.split(" ");
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

/** Peak resident set of a process (VmHWM), in MB. */
function peakRssMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  const kb = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? NaN);
  return kb / 1024;
}

async function fullIngest() {
  const url = new URL(process.env.DATABASE_URL!);
  const dbName = url.pathname.slice(1);
  execFileSync("bash", ["scripts/dev-db.sh", dbName], { stdio: "ignore" });
  const { getDb, getPool } = await import("@/db/client");
  const { customers, dealerships, users, dutyCycles } = await import("@/db/schema");
  const { createUpload } = await import("@/features/duty-cycles/server/create-upload");
  const { createDutyCycle } = await import("@/features/duty-cycles/server/create-duty-cycle");
  const { enqueueImport, getImportSender } =
    await import("@/features/duty-cycles/server/import-queue");
  const db = getDb();
  const [dealership] = await db
    .insert(dealerships)
    .values({ name: "Bench Dealership", slug: `bench-${Date.now()}` })
    .returning();
  const [user] = await db
    .insert(users)
    .values({ email: `bench-${Date.now()}@example.test`, name: "Bench" })
    .returning();
  const [customer] = await db
    .insert(customers)
    .values({ dealershipId: dealership!.id, name: "Bench Farm" })
    .returning();
  const actor = {
    userId: user!.id,
    email: user!.email,
    name: "Bench",
    dealershipId: dealership!.id,
    roles: ["estimator" as const],
    customerId: null,
    unitSystem: "metric" as const,
    currency: "EUR",
  };
  await getImportSender(); // queue schema ready before the clock starts

  // The worker as its own process, as in production.
  const worker = spawn(
    process.execPath,
    ["--conditions=react-server", "--import", "tsx", "scripts/worker.ts"],
    {
      env: process.env,
      stdio: ["ignore", "pipe", "inherit"],
    },
  );
  let workerLog = "";
  await new Promise<void>((resolve) =>
    worker.stdout!.on("data", (d: Buffer) => {
      workerLog += d.toString();
      if (d.toString().includes("waiting")) resolve();
    }),
  );
  let peak = peakRssMb(worker.pid!);
  const sampler = setInterval(() => {
    try {
      peak = Math.max(peak, peakRssMb(worker.pid!));
    } catch {
      // exited
    }
  }, 100);

  const workerCpu0 = cpuSeconds(worker.pid!);
  const t0 = process.hrtime.bigint();
  const upload = await createUpload({
    db,
    actor,
    body: Readable.toWeb(createReadStream(FILE)) as ReadableStream<Uint8Array>,
    fileName: "bench.csv",
    contentLength: statSync(FILE).size,
    limit: Number(process.env.UPLOAD_LIMIT_BYTES),
  });
  const uploadMs = ms(t0);
  const created = await createDutyCycle({
    db,
    actor,
    input: {
      source: "upload",
      name: "Bench log",
      customerId: customer!.id,
      uploadId: upload.id,
      mapping: BENCH_MAPPING,
    },
    enqueue: enqueueImport,
  });
  let row;
  for (;;) {
    [row] = await db.select().from(dutyCycles).where(eq(dutyCycles.id, created.id));
    if (row!.status === "ready" || row!.status === "failed") break;
    await new Promise((r) => setTimeout(r, 50));
  }
  const fullMs = ms(t0);
  const workerCpu = cpuSeconds(worker.pid!) - workerCpu0;
  peak = Math.max(peak, peakRssMb(worker.pid!));
  clearInterval(sampler);
  worker.kill("SIGTERM");
  await new Promise((r) => worker.on("exit", r));
  await (await getImportSender()).stop({ graceful: false, wait: true });
  await getPool().end();
  // The stored copy of the upload is only needed for this run.
  await rm(process.env.UPLOAD_DIR!, { recursive: true, force: true });
  if (row!.status !== "ready") throw new Error(`import failed: ${row!.failureReason}`);
  const jobMs = Number(/: ready in (\d+) ms/.exec(workerLog)?.[1] ?? NaN);
  const jobDetail = / ms( \(file .*\))/.exec(workerLog)?.[1] ?? "";
  return {
    uploadMs,
    fullMs,
    jobMs,
    jobDetail,
    workerCpu,
    peak,
    turns: (row!.summary as { turnsPerHour: number }).turnsPerHour * row!.operatingHours!,
    hours: row!.operatingHours!,
    rows: row!.rowsUsed,
  };
}

generate();
const size = statSync(FILE).size;
console.log(
  `Ingest benchmark: ${ROWS.toLocaleString("en-GB")} rows, ${(size / 1048576).toFixed(1)} MB, ${os.cpus()[0]?.model ?? "cpu"} x${os.cpus().length}, Node ${process.version}`,
);
let turns = 0;
const [bare, ours] = (await bestOfEach(7, [
  ["papaparse bare parse", bareParse],
  [
    "our parse + segment",
    async () => {
      turns = (await ourParse()).turns.length;
    },
  ],
])) as [{ wall: number; cpu: number }, { wall: number; cpu: number }];
const full = await fullIngest();
console.log(
  `${"full upload-to-stored-turns".padEnd(44)} ${(full.fullMs / 1000).toFixed(2)} s wall (upload ${(full.uploadMs / 1000).toFixed(2)} s, worker job ${(full.jobMs / 1000).toFixed(2)} s${full.jobDetail}, worker CPU ${full.workerCpu.toFixed(2)} s)`,
);
console.log(`${"worker peak RSS".padEnd(44)} ${full.peak.toFixed(0)} MB`);
console.log(
  `turns found ${turns}, rows used ${full.rows}, operating hours ${full.hours.toFixed(2)}`,
);
console.log(
  `ratios (wall): parse+segment ${(ours.wall / bare.wall).toFixed(2)}x bare (target <= 1.5), full ${(full.fullMs / bare.wall).toFixed(2)}x bare (target <= 3)`,
);
console.log(
  `ratios (CPU):  parse+segment ${(ours.cpu / bare.cpu).toFixed(2)}x bare, worker job ${((full.workerCpu * 1000) / bare.cpu).toFixed(2)}x bare; worker RSS ${full.peak < 300 ? "under" : "OVER"} 300 MB`,
);
console.log(
  `1-minute load average during the run: ${os.loadavg()[0]!.toFixed(1)} on ${os.cpus().length} cores`,
);
