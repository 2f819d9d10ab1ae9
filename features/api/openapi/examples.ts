// Request examples from the invented demo scenario (Brackenridge Machinery and its customers).
// Ids are placeholders: use the ids your own requests return.

const HOLLIN_VALE = "3f0c8a52-6a7e-4c1d-9b1e-2f4a9d6c0e11";
const LOADER_TRACTOR = "8d2e4b71-0c3a-4f5e-a6b9-1c7d2e8f9a30";
const UPLOAD = "c41b9e02-7d6f-4a8b-b3c5-9e0f1a2b3c4d";
const YARD_CYCLE = "5a6b7c8d-9e0f-4a1b-8c2d-3e4f5a6b7c8d";

export const EXAMPLES = {
  customer: {
    name: "Hollin Vale Farm",
    kind: "farm",
    contactName: "Morwenna Tregarthen",
    contactEmail: "morwenna@hollinvale.test",
    notes: "Mixed arable and grass; yard work in winter.",
  },
  site: {
    customerId: HOLLIN_VALE,
    name: "Hollin Vale home farm",
    surfaceMix: { grass: 0.5, "firm-soil": 0.3, gravel: 0.2 },
  },
  machine: {
    customerId: HOLLIN_VALE,
    kind: "tractor",
    spec: {
      name: "Hollin Vale loader tractor",
      wheelbase: 2.8,
      axles: {
        front: {
          track: 1.9,
          load: 30000,
          tyre: { designation: "480/70R28", treadDepthNew: 40, treadDepthReplace: 10, price: 1500 },
        },
        rear: {
          track: 1.9,
          load: 45000,
          tyre: { designation: "580/70R38", treadDepthNew: 50, treadDepthReplace: 12, price: 2400 },
        },
      },
      steering: { layout: "ideal", maxLock: 55 },
      drive: { type: "front-assist", gearRatio: 1.32 },
    },
  },
  telematicsCsv: "time_s,speed_kmh,yaw_dps,ground\n0.0,10.80,0.012,field\n0.5,10.78,-0.020,field\n",
  dutyCycleFromUpload: {
    source: "upload",
    name: "Hollin Vale loader, November log",
    customerId: HOLLIN_VALE,
    machineId: LOADER_TRACTOR,
    uploadId: UPLOAD,
    mapping: {
      kind: "telematics",
      delimiter: ",",
      decimal: ".",
      hasHeader: true,
      encoding: "utf-8",
      columns: {
        time: { index: 0, header: "time_s", unit: "s" },
        speed: { index: 1, header: "speed_kmh", unit: "km/h" },
        yawRate: { index: 2, header: "yaw_dps", unit: "deg/s" },
        surface: { index: 3, header: "ground", unit: "text" },
      },
      defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
    },
  },
  estimate: {
    machineId: LOADER_TRACTOR,
    dutyCycleId: YARD_CYCLE,
    title: "Hollin Vale loader tractor, November yard work",
  },
  reading: {
    position: "front-left",
    measuredOn: "2026-10-14",
    hourMeter: 2140,
    depthCentre: 28.5,
    measuredBy: "Brackenridge service van 2",
  },
} as const;
