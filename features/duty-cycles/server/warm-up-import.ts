// Runs in the worker process, so no "server-only" marker.
import { Readable } from "node:stream";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";
import { samplePath } from "@/lib/duty-cycles/synthetic-path";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";

const MAPPING: TColumnMapping = {
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
};

/**
 * Reads a small generated log through the import path once when a worker starts, so the
 * JavaScript engine has compiled the row-by-row code before the first customer file arrives
 * (the first large import otherwise runs partly unoptimised).
 */
export async function warmUpImport(): Promise<void> {
  const legs = Array.from({ length: 40 }, (_v, i) => [
    { kind: "straight" as const, distance: 100, speed: 3 },
    { kind: "arc" as const, radius: 6, headingChange: i % 2 ? -180 : 180, speed: 2 },
  ]).flat();
  const rows = samplePath({ legs, noise: { yawRate: 0.3 } }).map(
    (s) =>
      `${s.t.toFixed(1)},${(s.speed * 3.6).toFixed(2)},${s.yawRate.toFixed(2)},${s.lat.toFixed(7)},${s.lon.toFixed(7)},soil,${s.speed < 0 ? "R" : "F"}`,
  );
  const text = "t,v,yaw,lat,lon,surface,gear\n" + rows.join("\n") + "\n";
  for (let round = 0; round < 4; round++) {
    const importer = createTelematicsImporter(MAPPING);
    await readCsvRows({
      input: Readable.from([text]),
      delimiter: ",",
      hasHeader: true,
      onRecord: importer.pushRow,
    });
    importer.finish();
  }
}
