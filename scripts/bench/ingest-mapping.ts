import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";

/** The column mapping of the benchmark log written by ingest-generate.ts. */
export const BENCH_MAPPING: TColumnMapping = {
  kind: "telematics",
  delimiter: ",",
  decimal: ".",
  hasHeader: true,
  encoding: "utf-8",
  columns: {
    time: { index: 0, header: "time", unit: "s" },
    speed: { index: 1, header: "speed_kmh", unit: "km/h" },
    yawRate: { index: 2, header: "yaw_rate_dps", unit: "deg/s" },
    lat: { index: 3, header: "lat", unit: "deg" },
    lon: { index: 4, header: "lon", unit: "deg" },
    surface: { index: 5, header: "surface", unit: "text" },
    direction: { index: 6, header: "gear", unit: "text" },
  },
  defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
};
