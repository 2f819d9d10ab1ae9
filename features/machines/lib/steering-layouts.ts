import type { TSteering, TSteeringLayout } from "@/lib/scrub";

/** Plain names of the steering layouts, in the order a dealer meets them. */
export const LAYOUT_LABELS: Record<TSteeringLayout, string> = {
  trapezoid: "Front steer, track-rod linkage",
  parallel: "Front steer, equal wheel angles",
  ideal: "Front steer, ideal (reference)",
  articulated: "Articulated (centre pivot)",
  "four-wheel": "Four-wheel steer",
  crab: "Crab steer",
  rear: "Rear steer",
  turntable: "Turntable axle",
  skid: "Skid steer",
};

/** Which axles turn their wheels for steering in this layout. */
export function steeredAxles(layout: TSteeringLayout): ("front" | "rear")[] {
  switch (layout) {
    case "ideal":
    case "trapezoid":
    case "parallel":
    case "turntable":
      return ["front"];
    case "rear":
      return ["rear"];
    case "four-wheel":
    case "crab":
      return ["front", "rear"];
    case "articulated":
    case "skid":
      return [];
  }
}

/** The steering fields a layout asks for (beyond `layout`), in form order. */
export function steeringFields(layout: TSteeringLayout): string[] {
  switch (layout) {
    case "ideal":
    case "parallel":
    case "turntable":
      return ["maxLock"];
    case "trapezoid":
      return ["maxLock", "armLength", "armAngle", "tieRod"];
    case "articulated":
      return ["frontLength", "rearLength", "maxArticulation"];
    case "rear":
      return ["maxLock", "wheelAngles"];
    case "four-wheel":
      return ["maxLock", "rearRatio", "wheelAngles"];
    case "crab":
      return ["maxLock", "wheelAngles"];
    case "skid":
      return ["running", "contactLength", "effectiveTrackFactor"];
  }
}

/** Whether the wheelbase field means anything to the layout (articulated uses hinge lengths). */
export function usesWheelbase(layout: TSteeringLayout): boolean {
  return layout !== "articulated";
}

/**
 * Starting values when the user switches layout, keeping what carries over (lock angle).
 * Values are typical of the trade (common practice, no source) and meant to be edited.
 */
export function defaultSteering(layout: TSteeringLayout, previous?: TSteering): TSteering {
  const maxLock = previous && "maxLock" in previous ? previous.maxLock : 50;
  switch (layout) {
    case "ideal":
    case "parallel":
    case "turntable":
      return { layout, maxLock };
    case "trapezoid":
      return { layout, maxLock, armLength: 0.2, armAngle: 16, tieRod: "behind" };
    case "articulated":
      return { layout, frontLength: 1.4, rearLength: 1.4, maxArticulation: 40 };
    case "rear":
      return { layout, maxLock, wheelAngles: "ackermann" };
    case "four-wheel":
      return { layout, maxLock, rearRatio: 1, wheelAngles: "ackermann" };
    case "crab":
      return { layout, maxLock, wheelAngles: "parallel" };
    case "skid":
      return { layout, running: "wheeled" };
  }
}
