import type { TMachineInput } from "@/lib/scrub/schemas";

/**
 * Invented demo machines (pure data). Every name, farm and business is fictional; sizes are
 * plausible but are not any maker's specification. Reused by the seed and the golden test.
 */
export interface TDemoMachine {
  /** Stable id for seeds and golden files. */
  id: string;
  machine: TMachineInput;
}

export const DEMO_MACHINES: readonly TDemoMachine[] = [
  {
    id: "row-crop-tractor",
    machine: {
      name: "Hollin Vale Farm's 140 hp row-crop tractor",
      wheelbase: 2.75,
      axles: {
        front: {
          track: 1.9,
          pivotTrack: 1.7,
          load: 2600,
          ladenLoad: 3400,
          tyre: {
            designation: "380/85R28",
            treadDepthNew: 40,
            treadDepthReplace: 10,
            price: 900,
            loadCapacity: 2500,
          },
        },
        rear: {
          track: 1.9,
          load: 3900,
          ladenLoad: 3600,
          tyre: {
            designation: "460/85R38",
            treadDepthNew: 55,
            treadDepthReplace: 14,
            price: 1900,
            loadCapacity: 3650,
          },
        },
      },
      steering: {
        layout: "trapezoid",
        maxLock: 52,
        armLength: 0.2,
        armAngle: 17,
        tieRod: "behind",
      },
      drive: { type: "front-assist", gearRatio: 1.313 },
    },
  },
  {
    id: "articulated-loader",
    machine: {
      name: "Brackenridge Quarry's 18 t articulated loader",
      wheelbase: 3.3,
      axles: {
        front: {
          track: 2.1,
          load: 8000,
          ladenLoad: 12500,
          tyre: { designation: "20.5R25", treadDepthNew: 45, treadDepthReplace: 8, price: 3200 },
        },
        rear: {
          track: 2.1,
          load: 10000,
          ladenLoad: 9000,
          tyre: { designation: "20.5R25", treadDepthNew: 45, treadDepthReplace: 8, price: 3200 },
        },
      },
      steering: {
        layout: "articulated",
        frontLength: 1.55,
        rearLength: 1.75,
        maxArticulation: 40,
      },
      drive: { type: "4wd", interAxleRatio: 1 },
    },
  },
  {
    id: "wheeled-skid-steer",
    machine: {
      name: "Copper Lane Contracting's compact wheeled skid steer",
      wheelbase: 1.1,
      axles: {
        front: {
          track: 1.5,
          load: 1300,
          ladenLoad: 2100,
          tyre: {
            designation: "12-16.5",
            treadDepthNew: 22,
            treadDepthReplace: 4,
            price: 260,
            loadCapacity: 1600,
          },
        },
        rear: {
          track: 1.5,
          load: 1700,
          ladenLoad: 1500,
          tyre: {
            designation: "12-16.5",
            treadDepthNew: 22,
            treadDepthReplace: 4,
            price: 260,
            loadCapacity: 1600,
          },
        },
      },
      steering: { layout: "skid", running: "wheeled" },
      drive: { type: "4wd", interAxleRatio: 1 },
    },
  },
  {
    id: "telehandler",
    machine: {
      name: "Fallowmere Estate's 4 m telehandler",
      wheelbase: 2.9,
      axles: {
        front: {
          track: 1.9,
          pivotTrack: 1.6,
          load: 3600,
          ladenLoad: 5200,
          tyre: { designation: "460/70R24", treadDepthNew: 32, treadDepthReplace: 8, price: 1100 },
        },
        rear: {
          track: 1.9,
          pivotTrack: 1.6,
          load: 3400,
          ladenLoad: 2600,
          tyre: { designation: "460/70R24", treadDepthNew: 32, treadDepthReplace: 8, price: 1100 },
        },
      },
      steering: { layout: "four-wheel", maxLock: 38, rearRatio: 1, wheelAngles: "ackermann" },
      otherSteeringModes: [
        { layout: "crab", maxLock: 38, wheelAngles: "parallel" },
        { layout: "ideal", maxLock: 38 },
      ],
      drive: { type: "4wd", interAxleRatio: 1 },
    },
  },
  {
    id: "rear-steer-combine",
    machine: {
      name: "Millbrook Grain Co-op's rear-steer combine",
      wheelbase: 3.8,
      axles: {
        front: {
          track: 3.0,
          load: 11000,
          ladenLoad: 14000,
          tyre: { designation: "800/65R32", treadDepthNew: 50, treadDepthReplace: 15, price: 4200 },
        },
        rear: {
          track: 2.9,
          pivotTrack: 2.6,
          load: 4500,
          ladenLoad: 5000,
          tyre: { designation: "500/70R24", treadDepthNew: 38, treadDepthReplace: 10, price: 1300 },
        },
      },
      steering: { layout: "rear", maxLock: 55, wheelAngles: "ackermann" },
      drive: { type: "2wd", drivenAxle: "front" },
    },
  },
  {
    id: "turntable-wagon",
    machine: {
      name: "Ashgrove Dairy's turntable feed wagon",
      wheelbase: 3.5,
      axles: {
        front: {
          track: 1.8,
          load: 3000,
          ladenLoad: 6000,
          tyre: { designation: "400/60-15.5", treadDepthNew: 18, treadDepthReplace: 4, price: 380 },
        },
        rear: {
          track: 1.8,
          load: 3000,
          ladenLoad: 6000,
          tyre: { designation: "400/60-15.5", treadDepthNew: 18, treadDepthReplace: 4, price: 380 },
        },
      },
      steering: { layout: "turntable", maxLock: 60 },
      drive: { type: "2wd", drivenAxle: "rear" },
    },
  },
];
