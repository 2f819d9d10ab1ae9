import type { TMachineInput } from "@/lib/scrub";
import { defaultSteering } from "@/features/machines/lib/steering-layouts";

/**
 * A new machine starts blank wherever a figure belongs to the actual machine: wheelbase, tracks,
 * axle loads, tyre sizes, lug depths, prices and the front-axle gear ratio are entered from the
 * machine, a weighbridge ticket and the tyre maker's data, never left at an invented value (the
 * schema requires them, so the form cannot be saved until they are filled). What starts set is
 * a choice of layout and drive (front steer with a track-rod linkage, rear drive with front-wheel
 * assist) and the linkage's typical starting geometry the layout picker also uses, drawn live
 * beside the form for the user to match to the machine.
 */
export const STARTER_SPEC = {
  name: "",
  axles: {
    front: { tyre: { designation: "" } },
    rear: { tyre: { designation: "" } },
  },
  steering: defaultSteering("trapezoid"),
  otherSteeringModes: [],
  drive: { type: "front-assist" },
  limits: {},
} as unknown as TMachineInput;
