/**
 * Options benchmark, in one run:
 *  1. engine: a four-option comparison and a 41-point sweep over a duty cycle of 2,000 distinct
 *     turn kinds (demo front-assist tractor), CPU and wall time on one core (targets 0.5 s, 2 s);
 *  2. API: POST /api/v1/comparisons with the same four options against a stored estimate of that
 *     duty cycle, one client after another, through the real route handler, session check,
 *     PostgreSQL read of the frozen inputs, engine and insert (target p95 < 1 s).
 *
 *   DATABASE_URL=postgres://… npm run bench:options
 *
 * The API part calls the route handler in-process (no HTTP server in between); it creates its own
 * invented dealership each run.
 */
import os from "node:os";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import {
  compareOptions,
  sweepParameter,
  ZMachine,
  type TDutyCycleInput,
  type TOptionSpec,
} from "@/lib/scrub";
import { getPool } from "@/db/client";
import { POST as createCustomer } from "@/app/api/v1/customers/route";
import { POST as createMachine } from "@/app/api/v1/machines/route";
import { POST as createEstimate } from "@/app/api/v1/estimates/route";
import { POST as createComparison } from "@/app/api/v1/comparisons/route";
import { call, insertReadyDutyCycle, makeDealership } from "@/tests/support/records";

const KINDS = 2000;
const SWEEP_POINTS = 41;
const API_RUNS = Number(process.env.BENCH_API_RUNS ?? 30);
const ENGINE_RUNS = Number(process.env.BENCH_ENGINE_RUNS ?? 5);
const SURFACES = ["firm-soil", "concrete-asphalt", "gravel", "grass"] as const;

const demo = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!;
const machine = ZMachine.parse(demo.machine);

/** 2,000 distinct turn kinds (radius, heading change, surface vary; no two alike). */
function turnKinds() {
  return Array.from({ length: KINDS }, (_, i) => {
    const f = (i * 0.6180339887) % 1;
    return {
      label: `Turn ${i + 1}`,
      radius: 5 + f * 30,
      headingChange: 45 + (i % 136),
      perHour: 0.02 + ((i * 0.37) % 1) * 0.1,
      surface: SURFACES[i % SURFACES.length]!,
      direction: i % 2 === 0 ? ("left" as const) : ("right" as const),
    };
  });
}

const dutyCycle: TDutyCycleInput = {
  name: "Benchmark: 2,000 turn kinds",
  turns: turnKinds().map((t) => ({
    turn: {
      direction: t.direction,
      radius: t.radius,
      headingChange: t.headingChange,
      speed: 1.5,
      surface: t.surface,
    },
    perHour: t.perHour,
  })),
  straight: {
    distancePerHour: 3000,
    speed: 3,
    surfaceShares: { "firm-soil": 1 },
    frontDrive: "disengaged",
    ladenShare: 0.5,
  },
} as TDutyCycleInput;

const front = machine.axles.front.tyre;
const options: TOptionSpec[] = [
  {
    name: "Re-set arms",
    changes: [{ kind: "parameter", parameter: "armAngle", value: 16 }],
    oneOffCost: 480,
  },
  {
    name: "Wider front",
    changes: [
      { kind: "parameter", parameter: "frontTrack", value: machine.axles.front.track + 0.2 },
    ],
    oneOffCost: 900,
  },
  {
    name: "Less lead",
    changes: [{ kind: "parameter", parameter: "lead", value: 1 }],
    oneOffCost: 350,
  },
  {
    name: "Deeper front tread",
    changes: [
      {
        kind: "tyres",
        axle: "front",
        tyre: { ...front, treadDepthNew: front.treadDepthNew * 1.3 },
      },
      { kind: "ballast", front: 400, rear: 0 },
    ],
    oneOffCost: 2600,
  },
];
const sweepValues = Array.from(
  { length: SWEEP_POINTS },
  (_, i) => machine.axles.front.track - 0.3 + (0.6 * i) / (SWEEP_POINTS - 1),
);

function timed<T>(fn: () => T): { wall: number; cpu: number; value: T } {
  const c0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  const value = fn();
  const wall = Number(process.hrtime.bigint() - t0) / 1e9;
  const c = process.cpuUsage(c0);
  return { wall, cpu: (c.user + c.system) / 1e6, value };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;

async function benchApi() {
  const team = await makeDealership();
  const post = (handler: typeof createCustomer, path: string, body: unknown) =>
    call(handler, team.admin.cookie, path, { method: "POST", body });
  const customer = (await post(createCustomer, "/api/v1/customers", { name: "Benchmark Farm" }))
    .body.id;
  const m = await post(createMachine, "/api/v1/machines", {
    customerId: customer,
    kind: "tractor",
    spec: demo.machine,
  });
  const cycle = await insertReadyDutyCycle({
    dealershipId: team.dealershipId,
    customerId: customer,
    name: "Benchmark: 2,000 turn kinds",
    turns: turnKinds(),
  });
  const est = await post(createEstimate, "/api/v1/estimates", {
    machineId: m.body.id,
    dutyCycleId: cycle.id,
  });
  if (est.status !== 201) throw new Error(`estimate failed: ${JSON.stringify(est.body)}`);
  const latencies: number[] = [];
  for (let i = 0; i < API_RUNS + 2; i++) {
    const t0 = performance.now();
    const res = await post(createComparison, "/api/v1/comparisons", {
      estimateId: est.body.id,
      options,
    });
    const ms = performance.now() - t0;
    if (res.status !== 201) throw new Error(`comparison failed: ${JSON.stringify(res.body)}`);
    if (i >= 2) latencies.push(ms); // the first two warm the code paths and the pool
  }
  latencies.sort((a, b) => a - b);
  return { p50: percentile(latencies, 50), p95: percentile(latencies, 95), n: latencies.length };
}

async function main() {
  console.log(
    `[bench] ${os.cpus()[0]?.model ?? "cpu"} × ${os.cpus().length}, Node ${process.version}, load ${os.loadavg()[0]!.toFixed(2)}`,
  );
  // Warm-up: JIT and the turn cache's code paths (the cache itself is per call).
  compareOptions(demo.machine, dutyCycle, options.slice(0, 1));
  const comparisons: { wall: number; cpu: number }[] = [];
  const sweeps: { wall: number; cpu: number }[] = [];
  for (let i = 0; i < ENGINE_RUNS; i++) {
    const c = timed(() => compareOptions(demo.machine, dutyCycle, options, { hours: 2000 }));
    if (c.value.options.length !== 4) throw new Error("comparison lost an option");
    comparisons.push(c);
    const s = timed(() =>
      sweepParameter(demo.machine, dutyCycle, { parameter: "frontTrack", values: sweepValues }),
    );
    if (s.value.points.length !== SWEEP_POINTS) throw new Error("sweep lost a point");
    sweeps.push(s);
  }
  const cmp = {
    cpu: median(comparisons.map((x) => x.cpu)),
    wall: median(comparisons.map((x) => x.wall)),
  };
  const swp = { cpu: median(sweeps.map((x) => x.cpu)), wall: median(sweeps.map((x) => x.wall)) };
  console.log(
    `[bench] engine, ${KINDS} turn kinds: four-option comparison ${cmp.cpu.toFixed(3)} s CPU (${cmp.wall.toFixed(3)} s wall; target < 0.5 s), ${SWEEP_POINTS}-point sweep ${swp.cpu.toFixed(3)} s CPU (${swp.wall.toFixed(3)} s wall; target < 2 s); median of ${ENGINE_RUNS}`,
  );
  const api = await benchApi();
  console.log(
    `[bench] POST /api/v1/comparisons (four options, ${KINDS} turn kinds), one client, ${api.n} requests: p50 ${api.p50.toFixed(0)} ms, p95 ${api.p95.toFixed(0)} ms (target < 1000 ms); load ${os.loadavg()[0]!.toFixed(2)}`,
  );
  await getPool().end();
  const ok = cmp.cpu < 0.5 && swp.cpu < 2 && api.p95 < 1000;
  console.log(`[bench] ${ok ? "all targets met" : "a target was missed"}`);
}

await main();
