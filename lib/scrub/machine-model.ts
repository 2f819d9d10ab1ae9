import { toRadians } from "./angles";
import {
  CORNERING_STIFFNESS_COEFFICIENT,
  LOAD_REFERENCE_RATIO,
  NOMINAL_RATED_LOAD_PER_MM2,
  TREAD_WIDTH_FRACTION,
} from "./coefficients";
import { prepareTrapezoid } from "./linkage-outer-angle";
import { estimateRollingCircumference } from "./rolling-circumference";
import type { TAxle, TMachine, TSteering, TSteeringLayout } from "./schemas";
import { IcrLineMap, TrapezoidMap, TurntableMap, type WheelPivots } from "./steer-maps";
import type { SteerMap } from "./turn-solver";
import { tyreDimensions } from "./tyre-dimensions";
import { WheelSet } from "./wheel-set";

/** Axle data resolved once per estimate (SI, mm for tyre sizes). */
export interface PreparedAxle {
  name: "front" | "rear";
  track: number;
  pivotTrack: number;
  /** Scrub radius r_s = (track − pivotTrack)/2 (m). */
  scrubRadius: number;
  unladenKg: number;
  ladenKg: number;
  leftShare: number;
  designation: string;
  /** Rolling circumference (mm). */
  rollingCircumference: number;
  /** Tread contact width (mm). */
  treadWidth: number;
  corneringStiffnessCoefficient: number;
  /** Overall diameter, section width and section height (mm). */
  overallDiameter: number;
  sectionWidth: number;
  sectionHeight: number;
  /** Rated load of one tyre at its working pressure (kg), and where that figure came from. */
  ratedLoadKg: number;
  ratedLoadSource: "pressure-table" | "load-capacity" | "nominal";
  axle: TAxle;
  /** True when the designation could not be parsed and data-book values were used. */
  designationUnparsed: boolean;
}

/** One steering mode, prepared for repeated turn solves. */
export interface PreparedMode {
  steering: TSteering;
  layout: TSteeringLayout;
  /** x of the front and rear axle centres in this mode's body frame (m). */
  xFront: number;
  xRear: number;
  /** Largest steering input (rad): inner lock, articulation or crab angle. */
  maxInput: number;
  /** Turning-centre x for ICR-line layouts (m), 0 otherwise. */
  xc: number;
  /** Steer map for steered layouts, null for articulated / skid / crab. */
  map: SteerMap | null;
  pivots: WheelPivots;
  /** Kinematic input (rad) for path radius R of the origin, NaN when impossible. */
  kinematicInput: (radius: number) => number;
  wheels: WheelSet;
}

export interface PreparedMachine {
  machine: TMachine;
  wheelbase: number;
  front: PreparedAxle;
  rear: PreparedAxle;
  modes: Map<TSteeringLayout, PreparedMode>;
  defaultLayout: TSteeringLayout;
}

export function prepareMachine(machine: TMachine): PreparedMachine {
  const tracked = machine.steering.layout === "skid" && machine.steering.running === "tracked";
  const front = prepareAxle("front", machine.axles.front, tracked, machine.ballast?.front ?? 0);
  const rear = prepareAxle("rear", machine.axles.rear, tracked, machine.ballast?.rear ?? 0);
  const steering =
    machine.steering.layout === "articulated"
      ? machine.steering.frontLength + machine.steering.rearLength
      : machine.wheelbase;
  const modes = new Map<TSteeringLayout, PreparedMode>();
  for (const s of [machine.steering, ...machine.otherSteeringModes]) {
    if (!modes.has(s.layout)) modes.set(s.layout, prepareMode(s, steering, front, rear));
  }
  return {
    machine,
    wheelbase: steering,
    front,
    rear,
    modes,
    defaultLayout: machine.steering.layout,
  };
}

function prepareAxle(
  name: "front" | "rear",
  axle: TAxle,
  tracked: boolean,
  ballastKg: number,
): PreparedAxle {
  const tyre = axle.tyre;
  let overallDiameter = tyre.overallDiameter;
  let sectionWidth = tyre.sectionWidth;
  let rimMm: number | undefined;
  let designationUnparsed = false;
  if (!tracked) {
    try {
      const dims = tyreDimensions(tyre.designation);
      overallDiameter ??= dims.overallDiameter;
      sectionWidth ??= dims.sectionWidth;
      rimMm = dims.rimDiameter * 25.4;
    } catch (error) {
      if (overallDiameter === undefined || sectionWidth === undefined) {
        throw new Error(
          `${name} axle: ${(error as Error).message} Or enter the overall diameter and section width (mm) from the data book.`,
        );
      }
      designationUnparsed = true;
    }
  }
  if (!(tyre.treadDepthReplace < tyre.treadDepthNew)) {
    throw new Error(
      `${name} axle: replacement tread depth (${tyre.treadDepthReplace} mm) must be below the new depth (${tyre.treadDepthNew} mm).`,
    );
  }
  const pivotTrack = axle.pivotTrack ?? axle.track;
  const diameter = overallDiameter ?? 1000;
  const width = sectionWidth ?? 400;
  const sectionHeight =
    rimMm !== undefined && diameter > rimMm ? (diameter - rimMm) / 2 : 0.8 * width;
  const ratedLoadSource = axle.inflation
    ? "pressure-table"
    : tyre.loadCapacity !== undefined
      ? "load-capacity"
      : "nominal";
  return {
    name,
    track: axle.track,
    pivotTrack,
    scrubRadius: (axle.track - pivotTrack) / 2,
    unladenKg: axle.load + ballastKg,
    ladenKg: (axle.ladenLoad ?? axle.load) + ballastKg,
    leftShare: axle.leftShare ?? 0.5,
    designation: tyre.designation,
    rollingCircumference:
      tyre.rollingCircumference ?? estimateRollingCircumference(overallDiameter ?? 1000),
    treadWidth: TREAD_WIDTH_FRACTION * (sectionWidth ?? 400),
    corneringStiffnessCoefficient:
      tyre.corneringStiffnessCoefficient ?? CORNERING_STIFFNESS_COEFFICIENT,
    overallDiameter: diameter,
    sectionWidth: width,
    sectionHeight,
    ratedLoadKg:
      axle.inflation?.ratedLoad ??
      tyre.loadCapacity ??
      // No rating entered: the size's nominal rating, but never below what the heaviest wheel
      // load needs at the reference ratio (the tyre is assumed fitted for its load).
      Math.max(
        NOMINAL_RATED_LOAD_PER_MM2 * width * diameter,
        ((Math.max(axle.load, axle.ladenLoad ?? axle.load) + ballastKg) *
          Math.max(axle.leftShare ?? 0.5, 1 - (axle.leftShare ?? 0.5))) /
          LOAD_REFERENCE_RATIO,
      ),
    ratedLoadSource,
    axle,
    designationUnparsed,
  };
}

function pivotsAt(
  xFront: number,
  xRear: number,
  front: PreparedAxle,
  rear: PreparedAxle,
  frontSteered: boolean,
  rearSteered: boolean,
): WheelPivots {
  const fHalf = (frontSteered ? front.pivotTrack : front.track) / 2;
  const rHalf = (rearSteered ? rear.pivotTrack : rear.track) / 2;
  const fRs = frontSteered ? front.scrubRadius : 0;
  const rRs = rearSteered ? rear.scrubRadius : 0;
  return {
    px: [xFront, xFront, xRear, xRear],
    py: [fHalf, -fHalf, rHalf, -rHalf],
    scrubRadius: [fRs, fRs, rRs, rRs],
  };
}

function prepareMode(
  steering: TSteering,
  wheelbase: number,
  front: PreparedAxle,
  rear: PreparedAxle,
): PreparedMode {
  const wheels = new WheelSet(4);
  const base = { steering, layout: steering.layout, wheels };
  switch (steering.layout) {
    case "ideal":
    case "parallel":
    case "trapezoid": {
      const pivots = pivotsAt(wheelbase, 0, front, rear, true, false);
      const map =
        steering.layout === "trapezoid"
          ? new TrapezoidMap(
              pivots,
              prepareTrapezoid(
                front.pivotTrack,
                steering.armLength,
                toRadians(steering.armAngle),
                steering.tieRod,
              ),
            )
          : new IcrLineMap(
              pivots,
              0,
              0,
              [true, true, false, false],
              steering.layout === "parallel" ? [-1, 0, -1, -1] : [-1, -1, -1, -1],
            );
      return {
        ...base,
        xFront: wheelbase,
        xRear: 0,
        maxInput: toRadians(steering.maxLock),
        xc: 0,
        map,
        pivots,
        kinematicInput: (radius) => Math.atan2(wheelbase, radius - front.pivotTrack / 2),
      };
    }
    case "turntable": {
      const pivots = pivotsAt(wheelbase, 0, front, rear, false, false);
      return {
        ...base,
        xFront: wheelbase,
        xRear: 0,
        maxInput: toRadians(steering.maxLock),
        xc: 0,
        map: new TurntableMap(wheelbase, front.track, rear.track),
        pivots,
        kinematicInput: (radius) => Math.atan2(wheelbase, radius),
      };
    }
    case "rear": {
      const pivots = pivotsAt(0, -wheelbase, front, rear, false, true);
      return {
        ...base,
        xFront: 0,
        xRear: -wheelbase,
        maxInput: toRadians(steering.maxLock),
        xc: 0,
        map: new IcrLineMap(
          pivots,
          0,
          2,
          [false, false, true, true],
          steering.wheelAngles === "parallel" ? [-1, -1, -1, 2] : [-1, -1, -1, -1],
        ),
        pivots,
        kinematicInput: (radius) => Math.atan2(wheelbase, radius - rear.pivotTrack / 2),
      };
    }
    case "four-wheel": {
      const xf = wheelbase / 2;
      const xr = -wheelbase / 2;
      const k = steering.rearRatio;
      const xc = (k * xf + xr) / (1 + k);
      const pivots = pivotsAt(xf, xr, front, rear, true, true);
      return {
        ...base,
        xFront: xf,
        xRear: xr,
        maxInput: toRadians(steering.maxLock),
        xc,
        map: new IcrLineMap(
          pivots,
          xc,
          0,
          [true, true, true, true],
          steering.wheelAngles === "parallel" ? [-1, 0, -1, 2] : [-1, -1, -1, -1],
        ),
        pivots,
        kinematicInput: (radius) => {
          if (!(radius > Math.abs(xc))) return NaN;
          const yc = Math.sqrt(radius * radius - xc * xc);
          return Math.atan2(xf - xc, yc - front.pivotTrack / 2);
        },
      };
    }
    case "crab": {
      const pivots = pivotsAt(wheelbase / 2, -wheelbase / 2, front, rear, true, true);
      return {
        ...base,
        xFront: wheelbase / 2,
        xRear: -wheelbase / 2,
        maxInput: toRadians(steering.maxLock),
        xc: 0,
        map: null,
        pivots,
        kinematicInput: () => NaN,
      };
    }
    case "articulated": {
      const pivots = pivotsAt(wheelbase, 0, front, rear, false, false);
      return {
        ...base,
        xFront: wheelbase,
        xRear: 0,
        maxInput: toRadians(steering.maxArticulation),
        xc: 0,
        map: null,
        pivots,
        kinematicInput: () => NaN,
      };
    }
    case "skid": {
      const tracked = steering.running === "tracked";
      // A track with uniform pressure over length l acts like two contacts at ±l/4 (same
      // Coulomb turning moment μWl/4, Wong [M]); wheels sit at ±wheelbase/2.
      const half = tracked ? (steering.contactLength ?? wheelbase) / 4 : wheelbase / 2;
      const pivots = pivotsAt(half, -half, front, rear, false, false);
      return {
        ...base,
        xFront: half,
        xRear: -half,
        maxInput: Math.PI / 2,
        xc: 0,
        map: null,
        pivots,
        kinematicInput: () => NaN,
      };
    }
  }
}
