/**
 * Engine benchmark: turn solves per second on one core (trapezoid-linkage tractor with brush
 * tyres; wheeled skid steer) and the time to estimate a one-million-turn duty cycle.
 * Run: npm run bench:engine
 */
import { spawnSync } from "node:child_process";
import os from "node:os";
import { fileURLToPath } from "node:url";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { estimate, ZMachine, ZTurn, type TDutyCycleInput, type TTurnKind } from "@/lib/scrub";
import { prepareMachine } from "@/lib/scrub/machine-model";
import { solveUnitTurn } from "@/lib/scrub/solve-turn";
import { type TurnContext } from "@/lib/scrub/unit-turn";
import { DEFAULT_SURFACES } from "@/lib/scrub/surfaces";

function machineById(id: string) {
  const demo = DEMO_MACHINES.find((d) => d.id === id);
  if (!demo) throw new Error(`demo machine ${id} missing`);
  return demo.machine;
}

/** Distinct turns (no two alike, so no caching helps): radius and speed vary per turn. */
function turns(count: number, minRadius: number, skid: boolean): TTurnKind[] {
  const out: TTurnKind[] = [];
  for (let i = 0; i < count; i++) {
    const f = (i * 0.6180339887) % 1;
    out.push(
      ZTurn.parse({
        direction: i % 2 === 0 ? "left" : "right",
        radius: skid ? f * 4 : minRadius + f * 30,
        headingChange: 90 + (i % 91),
        // 0.5–3.5 m/s, capped so lateral acceleration stays ≤ 2 m/s² (every turn is solved).
        speed: Math.min(0.5 + ((i * 0.37) % 3), Math.sqrt(2 * (skid ? f * 4 : minRadius + f * 30))),
        surface: i % 3 === 0 ? "concrete-asphalt" : "firm-soil",
      }) as never,
    );
  }
  return out;
}

/** Wall-clock and process CPU seconds of fn (CPU time is less disturbed by other load). */
function timed(fn: () => void): { wall: number; cpu: number } {
  const c0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  fn();
  const wall = Number(process.hrtime.bigint() - t0) / 1e9;
  const c = process.cpuUsage(c0);
  return { wall, cpu: (c.user + c.system) / 1e6 };
}

function benchSolves(id: string, minRadius: number, skid: boolean): { wall: number; cpu: number } {
  const machine = ZMachine.parse(machineById(id));
  const pm = prepareMachine(machine);
  const mode = pm.modes.get(machine.steering.layout)!;
  const ctx: TurnContext = {
    surface: DEFAULT_SURFACES["firm-soil"],
    lead: null,
    longitudinalStiffnessCoefficient: 8,
  };
  const list = turns(200_000, minRadius, skid).map(
    (k) => k as unknown as ReturnType<typeof ZTurn.parse>,
  );
  let sink = 0;
  for (let i = 0; i < 20_000; i++) sink += solveUnitTurn(pm, mode, list[i]!, ctx).wheels[5]!; // warm-up
  const { wall, cpu } = timed(() => {
    for (const t of list) sink += solveUnitTurn(pm, mode, t, ctx).wheels[5]!;
  });
  if (Number.isNaN(sink)) console.log("(NaN energy seen)");
  return { wall: list.length / wall, cpu: list.length / cpu };
}

function benchDutyCycle(turnDetail: boolean): { wall: number; cpu: number } {
  const count = 1_000_000;
  const kinds: TDutyCycleInput["turns"] = [];
  for (let i = 0; i < count; i++) {
    const f = (i * 0.6180339887) % 1;
    kinds.push({
      turn: {
        direction: i % 2 === 0 ? "left" : "right",
        radius: 4 + f * 30,
        headingChange: 90 + (i % 91),
        speed: Math.min(0.5 + ((i * 0.37) % 3), Math.sqrt(2 * (4 + f * 30))),
        surface: i % 3 === 0 ? "concrete-asphalt" : "firm-soil",
      },
      perHour: 0.00002,
    });
  }
  const dutyCycle: TDutyCycleInput = {
    name: "one million distinct turns",
    turns: kinds,
    straight: { distancePerHour: 5000, speed: 2, surfaceShares: { "firm-soil": 1 } },
  };
  let turnsOut = 0;
  const time = timed(() => {
    turnsOut = estimate(machineById("row-crop-tractor"), dutyCycle, { turnDetail }).turns.length;
  });
  if (turnsOut !== count) throw new Error("turn count mismatch");
  return time;
}

const fmt = (n: number) => Math.round(n).toLocaleString("en-GB");
const rate = (r: { wall: number; cpu: number }) =>
  `${fmt(r.wall)} turn solves/s wall, ${fmt(r.cpu)} per CPU-second`;
const secs = (r: { wall: number; cpu: number }) =>
  `${r.wall.toFixed(2)} s wall, ${r.cpu.toFixed(2)} s CPU`;

const dutyArg = process.argv.find((a) => a.startsWith("--duty-cycle="));
if (dutyArg) {
  // Child run: one duty-cycle estimate in a fresh process (no garbage from earlier runs).
  console.log(JSON.stringify(benchDutyCycle(dutyArg.endsWith("=detail"))));
} else {
  console.log(
    `Node ${process.version}, ${os.cpus()[0]?.model ?? "cpu"} (${os.cpus().length} cores), load average ${os.loadavg()[0]?.toFixed(1)}`,
  );
  console.log(
    `trapezoid-linkage tractor, brush tyres: ${rate(benchSolves("row-crop-tractor", 4, false))}`,
  );
  console.log(
    `wheeled skid steer, brush tyres:        ${rate(benchSolves("wheeled-skid-steer", 0, true))}`,
  );
  for (const [flag, label] of [
    ["summary", "1,000,000-turn duty cycle, turnDetail: false"],
    ["detail", "1,000,000-turn duty cycle, turnDetail: true "],
  ] as const) {
    const child = spawnSync(
      process.execPath,
      [...process.execArgv, fileURLToPath(import.meta.url), `--duty-cycle=${flag}`],
      { encoding: "utf8", maxBuffer: 1 << 20 },
    );
    if (child.status !== 0) throw new Error(`duty-cycle run failed: ${child.stderr}`);
    const lines = child.stdout.trim().split("\n");
    console.log(`${label}: ${secs(JSON.parse(lines.at(-1) ?? "{}"))}`);
  }
}
