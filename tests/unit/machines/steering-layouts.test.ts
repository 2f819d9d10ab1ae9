import { describe, expect, it } from "vitest";
import { STEERING_LAYOUTS, ZSteering } from "@/lib/scrub";
import {
  defaultSteering,
  steeredAxles,
  steeringFields,
  usesWheelbase,
} from "@/features/machines/lib/steering-layouts";

describe("form adaptation to the steering layout", () => {
  it("gives every layout defaults the engine accepts, carrying the lock angle over", () => {
    for (const layout of STEERING_LAYOUTS) {
      const steering = defaultSteering(layout, { layout: "parallel", maxLock: 47 });
      expect(ZSteering.safeParse(steering).success, layout).toBe(true);
      if ("maxLock" in steering) expect(steering.maxLock).toBe(47);
    }
  });

  it("asks only for the fields a layout uses, and each is a field of that layout's schema", () => {
    expect(steeringFields("trapezoid")).toEqual(["maxLock", "armLength", "armAngle", "tieRod"]);
    expect(steeringFields("articulated")).toEqual(["frontLength", "rearLength", "maxArticulation"]);
    expect(steeringFields("skid")).not.toContain("maxLock");
    for (const layout of STEERING_LAYOUTS) {
      const keys = Object.keys(defaultSteering(layout));
      for (const f of steeringFields(layout)) {
        if (f === "contactLength" || f === "effectiveTrackFactor") continue; // optional, no default
        expect(keys, `${layout}.${f}`).toContain(f);
      }
    }
  });

  it("knows which axles steer (so pivot track shows only there) and when wheelbase applies", () => {
    expect(steeredAxles("trapezoid")).toEqual(["front"]);
    expect(steeredAxles("rear")).toEqual(["rear"]);
    expect(steeredAxles("four-wheel")).toEqual(["front", "rear"]);
    expect(steeredAxles("skid")).toEqual([]);
    expect(usesWheelbase("articulated")).toBe(false);
    expect(usesWheelbase("turntable")).toBe(true);
  });
});
