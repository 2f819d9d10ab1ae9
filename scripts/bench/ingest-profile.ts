// Our parse + segment, three times, for a CPU profile:
// node --cpu-prof --cpu-prof-dir=/tmp/prof --import tsx scripts/bench/ingest-profile.ts
import { createReadStream } from "node:fs";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { BENCH_MAPPING } from "./ingest-mapping";

for (let i = 0; i < 3; i++) {
  const t0 = performance.now();
  const imp = createTelematicsImporter(BENCH_MAPPING);
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
