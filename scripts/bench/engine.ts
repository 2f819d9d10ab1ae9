/**
 * Engine benchmark: turn solves per second on one core (trapezoid-linkage tractor with brush
 * tyres; wheeled skid steer) and the time to estimate a one-million-turn duty cycle.
 * Run: npm run bench:engine
 */
import os from "node:os";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { estimate, ZMachine, ZTurn, type TDutyCycleInput, type TTurnKind } from "@/lib/scrub";
import { prepareMachine } from "@/lib/scrub/machine-model";
import { solveUnitTurn, type TurnContext } from "@/lib/scrub/solve-turn";
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
        speed: 0.5 + ((i * 0.37) % 3),
        surface: i % 3 === 0 ? "concrete-asphalt" : "firm-soil",
      }) as never,
    );
  }
  return out;
}

function benchSolves(id: string, minRadius: number, skid: boolean): number {
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
  const start = process.hrtime.bigint();
  for (const t of list) sink += solveUnitTurn(pm, mode, t, ctx).wheels[5]!;
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  if (Number.isNaN(sink)) console.log("(NaN energy seen)");
  return list.length / seconds;
}

function benchDutyCycle(turnDetail: boolean): number {
  const count = 1_000_000;
  const kinds: TDutyCycleInput["turns"] = [];
  for (let i = 0; i < count; i++) {
    const f = (i * 0.6180339887) % 1;
    kinds.push({
      turn: {
        direction: i % 2 === 0 ? "left" : "right",
        radius: 4 + f * 30,
        headingChange: 90 + (i % 91),
        speed: 0.5 + ((i * 0.37) % 3),
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
  const start = process.hrtime.bigint();
  const result = estimate(machineById("row-crop-tractor"), dutyCycle, { turnDetail });
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  if (result.turns.length !== count) throw new Error("turn count mismatch");
  return seconds;
}

const fmt = (n: number) => Math.round(n).toLocaleString("en-GB");
console.log(
  `Node ${process.version}, ${os.cpus()[0]?.model ?? "cpu"} (${os.cpus().length} cores), single thread`,
);
console.log(
  `trapezoid-linkage tractor, brush tyres: ${fmt(benchSolves("row-crop-tractor", 4, false))} turn solves/s`,
);
console.log(
  `wheeled skid steer, brush tyres:        ${fmt(benchSolves("wheeled-skid-steer", 0, true))} turn solves/s`,
);
console.log(`1,000,000-turn duty cycle, per-wheel detail: ${benchDutyCycle(true).toFixed(2)} s`);
console.log(
  `1,000,000-turn duty cycle, no per-wheel detail: ${benchDutyCycle(false).toFixed(2)} s`,
);
