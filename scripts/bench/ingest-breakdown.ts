// Where the ingest time goes, stage by stage, on the benchmark log (run bench:ingest first).
// Usage: node --import tsx scripts/bench/ingest-breakdown.ts
import { createReadStream } from "node:fs";
import Papa from "papaparse";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { createTurnSegmenter } from "@/lib/scrub/segment-turns";
import { parseDecimal } from "@/lib/duty-cycles/units";
import { BENCH_MAPPING } from "./ingest-mapping";

const FILE = "var/bench/ingest-1000000.csv";
const open = () => createReadStream(FILE, { encoding: "utf8", highWaterMark: 256 * 1024 });

async function time(label: string, f: () => Promise<unknown>) {
  let best = Infinity;
  let bestCpu = Infinity;
  for (let i = 0; i < 5; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    await f();
    best = Math.min(best, performance.now() - t0);
    const c = process.cpuUsage(c0);
    bestCpu = Math.min(bestCpu, (c.user + c.system) / 1000);
  }
  console.log(`${label.padEnd(40)} ${best.toFixed(0)} ms wall, ${bestCpu.toFixed(0)} ms CPU`);
}

await time(
  "papaparse bare",
  () =>
    new Promise((resolve) =>
      Papa.parse(open() as unknown as File, {
        delimiter: ",",
        newline: "\n",
        chunk: () => undefined,
        complete: resolve,
      }),
    ),
);
await time("readCsvRows, no-op", () =>
  readCsvRows({ input: open(), delimiter: ",", hasHeader: true, onRecord: () => undefined }),
);
await time("readCsvRows + 5 numbers parsed", () =>
  readCsvRows({
    input: open(),
    delimiter: ",",
    hasHeader: true,
    onRecord: (f) => {
      for (let i = 0; i < 5; i++) parseDecimal(f[i]!, ".");
    },
  }),
);
await time("readCsvRows + segmenter only", () => {
  const seg = createTurnSegmenter();
  return readCsvRows({
    input: open(),
    delimiter: ",",
    hasHeader: true,
    onRecord: (f) => {
      seg.push({ t: +f[0]!, speed: +f[1]! / 3.6, yawRate: +f[2]! });
    },
  });
});
await time("full importer", async () => {
  const imp = createTelematicsImporter(BENCH_MAPPING);
  await readCsvRows({ input: open(), delimiter: ",", hasHeader: true, onRecord: imp.pushRow });
  imp.finish();
});
