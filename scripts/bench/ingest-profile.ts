// Our parse + segment, three times, for a CPU profile:
// node --cpu-prof --cpu-prof-dir=/tmp/prof --import tsx scripts/bench/ingest-profile.ts
import { createReadStream } from "node:fs";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";

const MAPPING = {
  kind: "telematics",
  delimiter: ",",
  decimal: ".",
  hasHeader: true,
  encoding: "utf-8",
  columns: {
    time: { index: 0, unit: "s" },
    speed: { index: 1, unit: "km/h" },
    yawRate: { index: 2, unit: "deg/s" },
    lat: { index: 3, unit: "deg" },
    lon: { index: 4, unit: "deg" },
    surface: { index: 5, unit: "text" },
    direction: { index: 6, unit: "text" },
  },
  defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
} as const;

for (let i = 0; i < 3; i++) {
  const t0 = performance.now();
  const imp = createTelematicsImporter(MAPPING as never);
  await readCsvRows({
    input: createReadStream("var/bench/ingest-1000000.csv", {
      encoding: "utf8",
      highWaterMark: 256 * 1024,
    }),
    delimiter: ",",
    hasHeader: true,
    onRecord: imp.pushRow,
  });
  console.log(`${(performance.now() - t0).toFixed(0)} ms, ${imp.finish().turns.length} turns`);
}
