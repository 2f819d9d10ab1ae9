import type { TMachineInput } from "@/lib/scrub";

/**
 * Starting values for a new machine: typical of a mid-size tractor (common practice, no source),
 * there to be overwritten. Name and tyre sizes start empty so they are always entered.
 */
export const STARTER_SPEC: TMachineInput = {
  name: "",
  wheelbase: 2.7,
  axles: {
    front: {
      track: 1.9,
      load: 2800,
      tyre: { designation: "", treadDepthNew: 40, treadDepthReplace: 10, price: 1200 },
    },
    rear: {
      track: 1.9,
      load: 4200,
      tyre: { designation: "", treadDepthNew: 50, treadDepthReplace: 12, price: 2000 },
    },
  },
  steering: { layout: "trapezoid", maxLock: 52, armLength: 0.2, armAngle: 16, tieRod: "behind" },
  otherSteeringModes: [],
  drive: { type: "front-assist", gearRatio: 1.3 },
  limits: {},
};
