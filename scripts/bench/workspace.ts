// Workspace benchmark: list endpoints under 50 concurrent clients, and the estimates page's
// largest contentful paint, against the production build with the seeded data plus a generated
// dealership of 500 customers, 2,000 machines and 10,000 estimates (all invented).
//
//   DATABASE_URL=postgres://… NEXT_DIST_DIR=.next PORT=3000 npm run bench:workspace
//
// Builds when the dist folder has no build, migrates and seeds, generates the dealership once
// (idempotent), starts `next start`, signs in through the real sign-in page in Chromium, then runs
// autocannon per endpoint and prints p50/p95/p99 and requests per second.
import { execFileSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import os from "node:os";
import autocannon from "autocannon";
import { eq, sql } from "drizzle-orm";
import { getDb, getPool } from "@/db/client";
import {
  customers,
  dealerships,
  estimates,
  machines,
  memberships,
  sites,
  users,
} from "@/db/schema";
import { hashPassword } from "@/lib/authz/password";
import { estimate } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { launchBrowser } from "@/tests/support/browser";

const PORT = process.env.PORT ?? "3000";
const DIST = process.env.NEXT_DIST_DIR ?? ".next";
const DURATION = Number(process.env.BENCH_DURATION ?? 10);
const CONNECTIONS = 50;
const PROCESSES = Number(process.env.BENCH_PROCESSES ?? 1);
const BASE = `http://localhost:${PORT}`;
const SLUG = "bench-ridgeway";
const EMAIL = "bench-admin@ridgeway.test";
const PASSWORD = "bench-ridgeway-password";
const COUNTS = { customers: 500, machines: 2000, estimates: 10_000 };

const db = getDb();
const run = (cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env) =>
  execFileSync(cmd, args, { stdio: "inherit", env });

const FARM_WORDS = [
  "Ridge",
  "Brook",
  "Moor",
  "Vale",
  "Holt",
  "Fen",
  "Combe",
  "Ley",
  "Wold",
  "Heath",
];
const KINDS = ["farm", "contractor", "estate", "council", "utility"];

async function generateDealership() {
  const [existing] = await db.select().from(dealerships).where(eq(dealerships.slug, SLUG));
  if (existing) {
    const [n] = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(estimates)
      .where(eq(estimates.dealershipId, existing.id));
    if ((n?.n ?? 0) >= COUNTS.estimates) return existing;
    await db.delete(dealerships).where(eq(dealerships.id, existing.id));
  }
  const t0 = performance.now();
  const [dealership] = await db
    .insert(dealerships)
    .values({ name: "Ridgeway Farm Machinery (benchmark)", slug: SLUG })
    .returning();
  const id = dealership!.id;
  const [user] = await db
    .insert(users)
    .values({
      email: EMAIL,
      name: "Benchmark Admin",
      passwordHash: await hashPassword(PASSWORD),
      emailVerified: new Date(),
      activeDealershipId: id,
    })
    .onConflictDoUpdate({ target: users.email, set: { activeDealershipId: id } })
    .returning();
  await db.insert(memberships).values({ dealershipId: id, userId: user!.id, role: "dealer_admin" });

  const customerRows = await db
    .insert(customers)
    .values(
      Array.from({ length: COUNTS.customers }, (_, i) => ({
        dealershipId: id,
        name: `${FARM_WORDS[i % 10]}${FARM_WORDS[Math.floor(i / 10) % 10]!.toLowerCase()} ${KINDS[i % 5] === "farm" ? "Farm" : "Contracting"} ${i + 1}`,
        kind: KINDS[i % 5]!,
        contactName: `Contact ${i + 1}`,
      })),
    )
    .returning({ id: customers.id });
  await db.insert(sites).values(
    customerRows.map((c, i) => ({
      dealershipId: id,
      customerId: c.id,
      name: `Yard ${i + 1}`,
      surfaceMix: { "concrete-asphalt": 0.3, "firm-soil": 0.7 },
    })),
  );
  // Real engine results for each demo layout, reused across the generated estimates.
  const results = DEMO_MACHINES.map((m) => estimate(m.machine, DEMO_DUTY_CYCLES[m.id]!));
  const machineRows: { id: string; customerId: string; name: string; demo: number }[] = [];
  for (let start = 0; start < COUNTS.machines; start += 500) {
    const batch = Array.from({ length: Math.min(500, COUNTS.machines - start) }, (_, j) => {
      const i = start + j;
      const demo = i % DEMO_MACHINES.length;
      const spec = {
        ...DEMO_MACHINES[demo]!.machine,
        name: `Machine ${i + 1} (${DEMO_MACHINES[demo]!.id})`,
      };
      return {
        dealershipId: id,
        customerId: customerRows[i % COUNTS.customers]!.id,
        name: spec.name,
        kind: "tractor",
        layout: spec.steering.layout,
        spec,
      };
    });
    const rows = await db
      .insert(machines)
      .values(batch)
      .returning({ id: machines.id, customerId: machines.customerId, name: machines.name });
    rows.forEach((r, j) =>
      machineRows.push({
        ...r,
        customerId: r.customerId!,
        demo: (start + j) % DEMO_MACHINES.length,
      }),
    );
  }
  for (let start = 0; start < COUNTS.estimates; start += 500) {
    const batch = Array.from({ length: Math.min(500, COUNTS.estimates - start) }, (_, j) => {
      const i = start + j;
      const m = machineRows[i % COUNTS.machines]!;
      const result = results[m.demo]!;
      const first = result.positions.find((p) => p.wearsFirst);
      return {
        dealershipId: id,
        customerId: m.customerId,
        machineId: m.id,
        title: `${m.name} · run ${i + 1}`,
        machineName: m.name,
        dutyCycleName: result.dutyCycleName,
        machineVersion: 1,
        engineVersion: result.engineVersion,
        inputs: {},
        result,
        costPerHour: result.costPerHour * (0.8 + ((i * 37) % 40) / 100),
        hoursToFirstReplacement: first?.hoursToReplacement ?? null,
        firstToWear: result.firstToWear,
        warningCount: result.warnings.length,
        createdAt: new Date(Date.now() - i * 60_000),
      };
    });
    await db.insert(estimates).values(batch);
  }
  // A database in service has been vacuumed; index-only counts depend on it.
  await db.execute(sql`vacuum analyze`);
  console.log(
    `[bench] generated the dealership in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
  );
  return dealership!;
}

async function waitFor(url: string, ms: number) {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer within ${ms} ms`);
}

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;
}

async function load(path: string, cookie: string, connections = CONNECTIONS, duration = DURATION) {
  const latencies: number[] = [];
  let non2xx = 0;
  const result = await autocannon({
    url: `${BASE}${path}`,
    connections,
    duration,
    headers: { cookie },
    setupClient: (client) => {
      client.on("response", (status: number, _bytes: number, time: number) => {
        if (status >= 200 && status < 300) latencies.push(time);
        else non2xx++;
      });
    },
  });
  latencies.sort((a, b) => a - b);
  return {
    path,
    requests: latencies.length,
    rps: result.requests.average,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    non2xx,
  };
}

async function main() {
  if (!existsSync(`${DIST}/BUILD_ID`)) {
    console.log(`[bench] no production build in ${DIST}: building`);
    run("node_modules/.bin/next", ["build"], {
      ...process.env,
      NEXT_DIST_DIR: DIST,
      NEXT_TELEMETRY_DISABLED: "1",
    });
  }
  run("node_modules/.bin/tsx", ["scripts/migrate.ts"]);
  run("node_modules/.bin/tsx", ["scripts/seed.ts"]);
  await generateDealership();

  const env = {
    ...process.env,
    NEXT_DIST_DIR: DIST,
    NODE_ENV: "production" as const,
    APP_URL: BASE,
    AUTH_URL: BASE,
  };
  const startArgs = ["start", "-H", "127.0.0.1", "-p", PORT];
  // BENCH_PROCESSES > 1 runs that many `next start` processes behind the port (node:cluster).
  const server =
    PROCESSES > 1
      ? spawn("node", ["scripts/bench/next-cluster.mjs", String(PROCESSES), "--", ...startArgs], {
          env,
          stdio: "ignore",
        })
      : spawn("node", ["node_modules/next/dist/bin/next", ...startArgs], { env, stdio: "ignore" });
  const browser = await launchBrowser();
  try {
    await waitFor(`${BASE}/api/health`, 30_000);
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${BASE}/sign-in`);
    await page.getByLabel("E-mail address").first().fill(EMAIL);
    await page.getByLabel("Password", { exact: true }).fill(PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    const cookie = (await context.cookies()).map((c) => `${c.name}=${c.value}`).join("; ");
    await context.close();

    const endpoints = [
      "/api/v1/customers?pageSize=25&sort=name",
      "/api/v1/customers?pageSize=25&page=15&sort=updatedAt&dir=desc",
      "/api/v1/customers?pageSize=25&q=moor",
      "/api/v1/sites?pageSize=25",
      "/api/v1/machines?pageSize=25&sort=name",
      "/api/v1/machines?pageSize=25&page=60&sort=customerName",
      "/api/v1/estimates?pageSize=25&sort=createdAt&dir=desc",
      "/api/v1/estimates?pageSize=25&page=200&sort=costPerHour&dir=desc",
      "/api/v1/machines?pageSize=25&layout=trapezoid&q=row-crop&sort=updatedAt&dir=desc",
      "/api/v1/search?q=ridge",
    ];
    // Reference, not a list: the framework plus one `select 1`, no session. Measured before and
    // after the lists, so each list's share of it comes from the same run on the same box.
    const HEALTH = "/api/health";
    // One short untimed pass so the server's code paths are compiled before measuring.
    await autocannon({
      url: `${BASE}${endpoints[6]}`,
      connections: 10,
      duration: 2,
      headers: { cookie },
    });
    const print = (r: Awaited<ReturnType<typeof load>>, solo: Awaited<ReturnType<typeof load>>) =>
      console.log(
        `[bench] ${r.path}: ${r.rps.toFixed(0)} req/s, p50 ${r.p50.toFixed(1)} ms, p95 ${r.p95.toFixed(1)} ms, p99 ${r.p99.toFixed(1)} ms, non-2xx ${r.non2xx}; one client: p50 ${solo.p50.toFixed(1)} ms, p95 ${solo.p95.toFixed(1)} ms; load ${os.loadavg()[0]!.toFixed(2)}`,
      );
    const healthBefore = await load(HEALTH, "");
    print(healthBefore, await load(HEALTH, "", 1, 3));
    const rows = [];
    for (const path of endpoints) {
      const r = await load(path, cookie);
      // One client alone: the time a request takes when it does not queue behind others.
      const solo = await load(path, cookie, 1, 3);
      rows.push(r);
      print(r, solo);
    }
    const healthAfter = await load(HEALTH, "");
    print(healthAfter, await load(HEALTH, "", 1, 3));
    const healthRps = (healthBefore.rps + healthAfter.rps) / 2;
    console.log(
      `[bench] /api/health: ${healthBefore.rps.toFixed(0)} req/s before the lists, ${healthAfter.rps.toFixed(0)} after; ratios below use the mean, ${healthRps.toFixed(0)} req/s`,
    );
    for (const r of rows)
      console.log(
        `[bench] ratio ${((100 * r.rps) / healthRps).toFixed(0).padStart(3)} % of /api/health  ${r.path}${r.rps >= healthRps / 2 ? "" : "  (below the 50 % goal)"}`,
      );

    // Largest contentful paint of the estimates list, cold browser cache each time.
    const lcps: number[] = [];
    for (let i = 0; i < 6; i++) {
      const ctx = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      await ctx.addCookies(
        await (async () =>
          cookie.split("; ").map((kv) => {
            const [name, ...rest] = kv.split("=");
            return { name: name!, value: rest.join("="), url: BASE };
          }))(),
      );
      const p = await ctx.newPage();
      await p.goto(`${BASE}/estimates`, { waitUntil: "load" });
      const lcp = await p.evaluate(
        () =>
          new Promise<number>((resolve) => {
            new PerformanceObserver((list) => {
              const entries = list.getEntries();
              resolve(entries[entries.length - 1]!.startTime);
            }).observe({ type: "largest-contentful-paint", buffered: true });
          }),
      );
      if (i > 0) lcps.push(lcp); // the first visit warms the server's page code
      await ctx.close();
    }
    lcps.sort((a, b) => a - b);
    console.log(
      `[bench] /estimates LCP over ${lcps.length} cold loads: median ${percentile(lcps, 50).toFixed(0)} ms, worst ${lcps[lcps.length - 1]!.toFixed(0)} ms`,
    );
    console.log(
      `[bench] machine: ${os.cpus().length} × ${os.cpus()[0]?.model ?? "cpu"}, node ${process.version}, ${CONNECTIONS} connections, ${DURATION} s per endpoint, ${PROCESSES} server process(es), load average ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(" ")}`,
    );
    const worstP95 = Math.max(...rows.map((r) => r.p95));
    console.log(
      `[bench] worst list p95 ${worstP95.toFixed(1)} ms (target < 50), LCP median ${percentile(lcps, 50).toFixed(0)} ms (target < 1500)`,
    );
  } finally {
    await browser.close();
    server.kill("SIGTERM");
    await getPool().end();
  }
}

await main();
