// Benchmark: calibrate, plan and check a dealership of 2,000 machines with 20 reading visits
// each (4 positions per visit, so 160,000 readings). Prints figures; target under 10 s.
// Usage: npm run bench:calibration [-- machines=2000 visits=20 runs=5]
import os from "node:os";
import {
  computeFleet,
  TYRE_POSITIONS,
  type TFleetMachineInput,
  type TReadingPoint,
} from "@/lib/calibration";
import { estimate } from "@/lib/scrub";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`${name}=`))?.split("=")[1] ?? fallback);
const MACHINES = arg("machines", 2000);
const VISITS = arg("visits", 20);
const RUNS = arg("runs", 5);

// The engine's real per-position split for each demo machine (computed once, as stored estimates).
const kinds = DEMO_MACHINES.map((d) => ({
  d,
  result: estimate(d.machine, DEMO_DUTY_CYCLES[d.id]!),
}));

let seed = 42;
const rand = () => ((seed = (1664525 * seed + 1013904223) >>> 0) + 0.5) / 2 ** 32;

function makeFleet(): TFleetMachineInput[] {
  return Array.from({ length: MACHINES }, (_, i) => {
    const { d, result } = kinds[i % kinds.length]!;
    const truth = { base: 0.7 + rand(), scrub: 0.5 + 2 * rand() };
    const readings: TReadingPoint[] = [];
    for (const position of TYRE_POSITIONS) {
      const p = result.positions.find((x) => x.position === position)!;
      const tyre = position.startsWith("front")
        ? d.machine.axles.front.tyre
        : d.machine.axles.rear.tyre;
      const rate = (truth.base * p.wearPer100h.base + truth.scrub * p.wearPer100h.scrub) / 100;
      for (let v = 0; v < VISITS; v++) {
        const hour = 500 + v * 40;
        const depth = tyre.treadDepthNew - rate * v * 40 + (rand() - 0.5) * 0.4;
        readings.push({
          position,
          kind: "reading",
          measuredOn: new Date(Date.UTC(2025, 0, 1 + v * 14)).toISOString().slice(0, 10),
          hourMeter: hour,
          depthCentre: depth,
          depthInner: depth - 0.2,
          depthOuter: depth + 0.1,
        });
      }
    }
    return {
      machineId: `m${i}`,
      machineName: `Bench machine ${i}`,
      customerId: `c${i % 150}`,
      customerName: `Bench customer ${i % 150}`,
      positions: result.positions.map((p) => {
        const tyre = p.position.startsWith("front")
          ? d.machine.axles.front.tyre
          : d.machine.axles.rear.tyre;
        return {
          position: p.position,
          designation: p.designation,
          components: { base: p.wearPer100h.base, scrub: p.wearPer100h.scrub },
          treadDepthNew: tyre.treadDepthNew,
          treadDepthReplace: tyre.treadDepthReplace,
          price: tyre.price,
        };
      }),
      designations: Object.fromEntries(
        TYRE_POSITIONS.map((pos) => {
          const t = pos.startsWith("front")
            ? d.machine.axles.front.tyre
            : d.machine.axles.rear.tyre;
          return [
            pos,
            { designation: t.designation, price: t.price, treadDepthReplace: t.treadDepthReplace },
          ];
        }),
      ) as TFleetMachineInput["designations"],
      surfaceShares: DEMO_DUTY_CYCLES[d.id]!.straight.surfaceShares,
      readings,
    };
  });
}

const fleet = makeFleet();
const times: number[] = [];
let result: ReturnType<typeof computeFleet> = [];
for (let r = 0; r < RUNS; r++) {
  const t0 = performance.now();
  result = computeFleet(fleet, { alertWithinHours: 150 });
  times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
const own = result.filter((m) => m.calibration?.source === "machine").length;
const pooled = result.filter((m) => m.calibration?.source === "pooled").length;
const refused = result.filter((m) => m.calibration?.source === "none").length;
console.log(`machines ${MACHINES}, visits ${VISITS}, readings ${MACHINES * VISITS * 4}`);
console.log(`calibrated: ${own} own fit, ${pooled} pooled, ${refused} refused`);
console.log(
  `computeFleet (fit + plan + alerts): best ${(times[0]! / 1000).toFixed(2)} s, median ${(times[Math.floor(RUNS / 2)]! / 1000).toFixed(2)} s over ${RUNS} runs`,
);
console.log(
  `heap used ${(process.memoryUsage().heapUsed / 1048576).toFixed(0)} MB; node ${process.version}; ${os.cpus().length}× ${os.cpus()[0]?.model}; load ${os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(" ")}`,
);
