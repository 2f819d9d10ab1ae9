/**
 * Public contract of the scrub and wear engine: zod schemas for what goes in (machine, turn,
 * duty cycle, surfaces) and the types of what comes out (estimate result).
 *
 * Conventions (see docs/engine.md):
 * - SI units (m, N, J, s, kg), angles in degrees, tyre dimensions in mm.
 * - Body frame x forward, y left; origin at the centre of the fixed (non-steered) axle, or at the
 *   machine centre (mid-wheelbase) for skid steer, four-wheel and crab steering.
 * - Turn radius R = path radius of that origin. `pivotTrack` = distance between the steering
 *   pivots at the ground.
 */
import { z } from "zod";

// ---------------------------------------------------------------------------------------------
// Surfaces
// ---------------------------------------------------------------------------------------------

/** Ground the machine turns or travels on. */
export const ZSurfaceKind = z.enum([
  "concrete-asphalt",
  "gravel",
  "firm-soil",
  "loose-soil",
  "grass",
]);
export type TSurfaceKind = z.infer<typeof ZSurfaceKind>;

/** Friction and abrasion of one surface. */
export const ZSurfaceProperties = z.object({
  /** Lateral sliding friction coefficient of rubber on this ground (dimensionless). */
  friction: z.number().positive().max(2),
  /** Multiplier on the tread wear coefficient; concrete/asphalt = 1 (dimensionless). */
  abrasion: z.number().nonnegative().max(20),
  /** Cone index of soil (kPa) for the traction model (Brixius); ignored on hard ground. */
  coneIndex: z.number().positive().max(10_000).optional(),
});
export type TSurfaceProperties = z.infer<typeof ZSurfaceProperties>;

/** User overrides of the default surface table, any field of any surface. */
export const ZSurfaceOverrides = z.partialRecord(ZSurfaceKind, ZSurfaceProperties.partial());
export type TSurfaceOverrides = z.infer<typeof ZSurfaceOverrides>;

// ---------------------------------------------------------------------------------------------
// Machine
// ---------------------------------------------------------------------------------------------

/** Wheel positions. Tracked skid steers use them for the front and rear half of each track. */
export const ZPosition = z.enum(["front-left", "front-right", "rear-left", "rear-right"]);
export type TPosition = z.infer<typeof ZPosition>;

/** Tyre fitted to both wheels of one axle. */
export const ZTyreFitment = z.object({
  /** Size designation as moulded on the sidewall, e.g. "480/80R46", "18.4-38", "12-16.5". */
  designation: z.string().trim().min(1),
  /** Rolling circumference (mm) from the maker's data book; overrides the estimate from the size. */
  rollingCircumference: z.number().positive().optional(),
  /** Overall diameter (mm) from the maker's data book; overrides the nominal one. */
  overallDiameter: z.number().positive().optional(),
  /** Section width (mm) from the maker's data book; overrides the nominal one. */
  sectionWidth: z.number().positive().optional(),
  /** Tread (lug) depth when new (mm). */
  treadDepthNew: z.number().positive(),
  /** Tread depth at which the tyre is replaced (mm). */
  treadDepthReplace: z.number().nonnegative(),
  /** Price of one tyre (dealership currency, no unit conversion is done). */
  price: z.number().nonnegative(),
  /** Declared load capacity of one tyre at the working pressure and speed (kg). */
  loadCapacity: z.number().positive().optional(),
  /** Cornering stiffness per unit load C_α/F_z (1/rad); placeholder default when omitted. */
  corneringStiffnessCoefficient: z.number().positive().max(30).optional(),
});
export type TTyreFitment = z.infer<typeof ZTyreFitment>;

/** One axle: geometry, load and tyres. */
export const ZAxle = z.object({
  /** Track between tyre contact centres (m). */
  track: z.number().positive().max(10),
  /** Steered axles: distance between the steering pivots at the ground (m); defaults to `track`. */
  pivotTrack: z.number().positive().max(10).optional(),
  /** Mass carried by the axle at rest, unladen (kg). */
  load: z.number().positive(),
  /** Mass carried by the axle when laden (kg); defaults to `load`. */
  ladenLoad: z.number().positive().optional(),
  /** Share of the axle load on the left wheel (0..1); 0.5 when omitted. */
  leftShare: z.number().min(0.05).max(0.95).optional(),
  /** Tyres on this axle. */
  tyre: ZTyreFitment,
  /**
   * Working inflation pressure and the tyre maker's rated load per tyre at that pressure (and
   * the working speed). Optional: without it the declared load capacity, or a nominal rating
   * from the tyre size, is used (docs/engine.md, "Load and pressure").
   */
  inflation: z
    .object({
      /** Inflation pressure (kPa). */
      pressure: z.number().positive().max(1000),
      /** Rated load of one tyre at that pressure (kg), from the maker's load–pressure table. */
      ratedLoad: z.number().positive(),
    })
    .optional(),
});
export type TAxle = z.infer<typeof ZAxle>;

/** How the wheels of a steered axle are angled relative to each other. */
export const ZWheelAngleRule = z.enum(["ackermann", "parallel"]);
export type TWheelAngleRule = z.infer<typeof ZWheelAngleRule>;

/** Largest road-wheel steer angle of the inner wheel (deg). */
const maxLock = z.number().positive().max(89);

const ZIdealSteering = z.object({
  /** Front steer that meets the Ackermann condition exactly (reference layout). */
  layout: z.literal("ideal"),
  maxLock,
});
const ZTrapezoidSteering = z.object({
  /** Front steer through a four-bar (trapezoid) linkage. */
  layout: z.literal("trapezoid"),
  maxLock,
  /** Steering arm length, pivot to ball joint (m). */
  armLength: z.number().positive().max(2),
  /** Arm angle from the fore-aft axis at straight ahead, inclined inboard (deg). */
  armAngle: z.number().min(0).max(60),
  /** Tie rod behind the axle (arms point rearward) or ahead of it (arms point forward). */
  tieRod: z.enum(["behind", "ahead"]),
});
const ZParallelSteering = z.object({
  /** Front steer with both wheels at the same angle (0 % Ackermann). */
  layout: z.literal("parallel"),
  maxLock,
});
const ZTurntableSteering = z.object({
  /** Whole front axle pivots about a king bolt at its centre (wagons). */
  layout: z.literal("turntable"),
  /** Largest axle swing angle (deg). */
  maxLock,
});
const ZArticulatedSteering = z.object({
  /** Centre-pivot frame steering; `wheelbase` is ignored (frontLength + rearLength). */
  layout: z.literal("articulated"),
  /** Hinge to front-axle centre (m). */
  frontLength: z.number().positive().max(10),
  /** Hinge to rear-axle centre (m). */
  rearLength: z.number().positive().max(10),
  /** Largest articulation angle between the frames (deg). */
  maxArticulation: z.number().positive().max(60),
});
const ZRearSteering = z.object({
  /** Rear axle steered, front axle fixed (combines, forklifts). Origin at the front axle. */
  layout: z.literal("rear"),
  maxLock,
  wheelAngles: ZWheelAngleRule.default("ackermann"),
});
const ZFourWheelSteering = z.object({
  /** Coordinated counter-phase steer of both axles. Origin at mid-wheelbase. */
  layout: z.literal("four-wheel"),
  /** Largest front inner-wheel angle (deg). */
  maxLock,
  /** Rear/front ratio of single-track steer tangents (1 = symmetric; rear steers opposite). */
  rearRatio: z.number().positive().max(1.5).default(1),
  wheelAngles: ZWheelAngleRule.default("ackermann"),
});
const ZCrabSteering = z.object({
  /** All wheels steered the same way; the machine moves sideways-on. Origin at mid-wheelbase. */
  layout: z.literal("crab"),
  maxLock,
  /** "parallel" = all wheels at one angle; "ackermann" = an Ackermann linkage left active. */
  wheelAngles: ZWheelAngleRule.default("parallel"),
});
const ZSkidSteering = z.object({
  /** Skid steer: no steered wheels, turns by side-speed difference. Origin at mid-wheelbase. */
  layout: z.literal("skid"),
  running: z.enum(["wheeled", "tracked"]).default("wheeled"),
  /** Tracked: ground contact length of each track (m). */
  contactLength: z.number().positive().max(10).optional(),
  /** Effective-track factor χ = B_eff/B ≥ 1 (longitudinal slip); placeholder default. */
  effectiveTrackFactor: z.number().min(1).max(3).optional(),
});

/** Steering layout, discriminated on `layout`. */
export const ZSteering = z.discriminatedUnion("layout", [
  ZIdealSteering,
  ZTrapezoidSteering,
  ZParallelSteering,
  ZTurntableSteering,
  ZArticulatedSteering,
  ZRearSteering,
  ZFourWheelSteering,
  ZCrabSteering,
  ZSkidSteering,
]);
export type TSteering = z.infer<typeof ZSteering>;
export type TSteeringLayout = TSteering["layout"];
export const STEERING_LAYOUTS = [
  "ideal",
  "trapezoid",
  "parallel",
  "turntable",
  "articulated",
  "rear",
  "four-wheel",
  "crab",
  "skid",
] as const satisfies readonly TSteeringLayout[];

/** Drive line. */
export const ZDrive = z.discriminatedUnion("type", [
  z.object({
    /** One driven axle. */
    type: z.literal("2wd"),
    drivenAxle: z.enum(["front", "rear"]).default("rear"),
  }),
  z.object({
    /** Rear drive plus engageable front-wheel assist (MFWD). */
    type: z.literal("front-assist"),
    /** Front-axle revolutions per rear-axle revolution with the assist engaged. */
    gearRatio: z.number().positive().max(5),
  }),
  z.object({
    /** Permanent four-wheel drive with a fixed inter-axle ratio (no centre differential). */
    type: z.literal("4wd"),
    /** Front-axle revolutions per rear-axle revolution (1 for equal axles). */
    interAxleRatio: z.number().positive().max(5).default(1),
  }),
]);
export type TDrive = z.infer<typeof ZDrive>;

/** Tread-depth wear coefficient k_h per position (mm per MJ of frictional energy at abrasion 1). */
export const ZWearCoefficients = z.partialRecord(ZPosition, z.number().nonnegative());

/** A machine as the engine needs it. */
export const ZMachine = z.object({
  /** Display name, e.g. "Hollin Vale Farm's 140 hp row-crop tractor". */
  name: z.string().trim().min(1),
  /** Front-axle to rear-axle centre distance (m); articulated: frontLength + rearLength is used. */
  wheelbase: z.number().positive().max(15),
  axles: z.object({ front: ZAxle, rear: ZAxle }),
  /** Default steering mode. */
  steering: ZSteering,
  /** Further selectable modes (e.g. crab on a telehandler); a turn picks one by `layout`. */
  otherSteeringModes: z.array(ZSteering).default([]),
  drive: ZDrive,
  limits: z
    .object({
      /** Smallest turning radius (m) to the outer tyre contact centre, ISO 7457 sense. */
      minTurningRadius: z.number().positive().optional(),
    })
    .default({}),
  /** Calibrated wear coefficients k_h (mm/MJ) per position; replace the placeholder model. */
  wearCoefficients: ZWearCoefficients.optional(),
  /** Ballast added to each axle (kg), on top of the unladen and laden loads. */
  ballast: z
    .object({
      front: z.number().nonnegative().default(0),
      rear: z.number().nonnegative().default(0),
    })
    .optional(),
});
export type TMachine = z.infer<typeof ZMachine>;
export type TMachineInput = z.input<typeof ZMachine>;

// ---------------------------------------------------------------------------------------------
// Turns and duty cycles
// ---------------------------------------------------------------------------------------------

/** Fields of a turn without the radius/steerInput check (for forms that extend it). */
export const ZTurnFields = z.object({
  /** Short label shown in results, e.g. "headland U-turn". */
  label: z.string().trim().max(120).optional(),
  direction: z.enum(["left", "right"]),
  /** Path radius of the reference point (m); skid steer may use 0 (pivot turn). */
  radius: z.number().nonnegative().max(10_000).optional(),
  /** Alternative to radius: inner-wheel steer angle, articulation angle or crab angle (deg). */
  steerInput: z.number().nonnegative().max(89).optional(),
  /** Heading change of the machine (deg), e.g. 180 for a U-turn; 0 for crab traverses. */
  headingChange: z.number().nonnegative().max(3600),
  /** Crab mode: distance travelled (m). */
  crabDistance: z.number().nonnegative().optional(),
  /** Travel speed of the reference point (m/s). */
  speed: z.number().nonnegative().max(20).default(1.5),
  surface: ZSurfaceKind,
  loadState: z.enum(["unladen", "laden"]).default("unladen"),
  /** Steering mode used (one of the machine's layouts); the machine's default when omitted. */
  steeringMode: z
    .enum(STEERING_LAYOUTS as unknown as [TSteeringLayout, ...TSteeringLayout[]])
    .optional(),
  /** Front-wheel assist engaged during the turn (front-assist drive only). */
  frontDrive: z.enum(["engaged", "disengaged"]).default("engaged"),
  /** Differentials of the driven axles locked. */
  differentialLock: z.boolean().default(false),
});

/** One turn (or one crab traverse). Give `radius` or `steerInput` (not both). */
export const ZTurn = ZTurnFields.refine(
  (t) => (t.radius === undefined) !== (t.steerInput === undefined),
  {
    message: "Give either radius or steerInput for each turn, not both or neither.",
    path: ["radius"],
  },
);
export type TTurn = z.infer<typeof ZTurn>;
export type TTurnInput = z.input<typeof ZTurn>;

/** A turn kind of a duty cycle and how often it occurs. */
export const ZTurnKind = z.object({
  turn: ZTurn,
  /** Occurrences per operating hour. */
  perHour: z.number().nonnegative(),
});
export type TTurnKind = z.infer<typeof ZTurnKind>;

/** Straight travel per operating hour (base rolling wear, front-assist lead). */
export const ZStraightTravel = z.object({
  /** Distance travelled straight per operating hour (m). */
  distancePerHour: z.number().nonnegative(),
  /** Typical straight speed (m/s). */
  speed: z.number().nonnegative().max(20),
  /** Share of straight distance per surface (fractions; normalised to sum 1). */
  surfaceShares: z.partialRecord(ZSurfaceKind, z.number().nonnegative()),
  /** Front-wheel assist engaged in straight travel (front-assist drive only). */
  frontDrive: z.enum(["engaged", "disengaged"]).default("disengaged"),
  /** Share of straight distance travelled laden (0..1). */
  ladenShare: z.number().min(0).max(1).default(0),
  /**
   * Field blocks worked under drawbar pull (tillage, drilling, towing in the field). Each is a
   * share of the straight distance on one soil surface with the implement draught (N) or the
   * pull as a share of the machine's weight. Omitted: no drawbar work (free rolling).
   */
  drawbarWork: z
    .array(
      z
        .object({
          label: z.string().trim().max(120).optional(),
          /** Share of the straight distance worked under this pull (0..1). */
          distanceShare: z.number().min(0).max(1),
          /** Soil the block is worked on. */
          surface: ZSurfaceKind,
          /** Implement draught at working speed (N). */
          draught: z.number().nonnegative().max(500_000).optional(),
          /** Alternative to draught: drawbar pull as a share of the machine's weight (0..0.8). */
          pullShare: z.number().min(0).max(0.8).optional(),
        })
        .refine((b) => (b.draught === undefined) !== (b.pullShare === undefined), {
          message: "Give either draught (N) or pullShare for each drawbar-work block, not both.",
          path: ["draught"],
        }),
    )
    .default([]),
});
export type TStraightTravel = z.infer<typeof ZStraightTravel>;

/** A duty cycle: what one operating hour of work looks like. */
export const ZDutyCycle = z.object({
  name: z.string().trim().min(1),
  turns: z.array(ZTurnKind),
  straight: ZStraightTravel,
  /** Surface friction/abrasion overrides for this duty cycle. */
  surfaces: ZSurfaceOverrides.default({}),
});
export type TDutyCycle = z.infer<typeof ZDutyCycle>;
export type TDutyCycleInput = z.input<typeof ZDutyCycle>;

// ---------------------------------------------------------------------------------------------
// Estimate options
// ---------------------------------------------------------------------------------------------

/**
 * The calibratable wear coefficients (all non-negative). Calibration fits them to measured tread
 * loss and passes them as `options.wearCoefficients` to estimate / compareOptions / sweepParameter.
 */
export const ZWearModelCoefficients = z.object({
  /** Abradability γ (mm³ of tread per J of frictional energy): scrub, wind-up and traction slip. */
  abradability: z.number().positive().optional(),
  /** Base rolling wear at rated load on concrete/asphalt (mm of tread per km). */
  baseWearPerKm: z.number().nonnegative().optional(),
  /** Exponent n of the load ratio (W/W_rated)^n on base wear. */
  loadWearExponent: z.number().nonnegative().max(4).optional(),
  /** Land/gross ratio of the tread contact (0..1). */
  landRatio: z.number().positive().max(1).optional(),
  /** Longitudinal slip stiffness per unit load (force per unit slip ratio per N). */
  longitudinalStiffnessCoefficient: z.number().positive().optional(),
});
export type TWearModelCoefficients = z.infer<typeof ZWearModelCoefficients>;

/** Overrides of the engine's placeholder coefficients (see docs/engine.md). */
export const ZEstimateOptions = z.object({
  /** Abradability γ (mm³ of tread per J of frictional energy). */
  abradability: z.number().positive().optional(),
  /** Base rolling wear on concrete/asphalt (mm of tread per km), scaled by surface abrasion. */
  baseWearPerKm: z.number().nonnegative().optional(),
  /** Land/gross ratio of the tread contact (0..1). */
  landRatio: z.number().positive().max(1).optional(),
  /** Longitudinal slip stiffness per unit load (force per unit slip ratio per N). */
  longitudinalStiffnessCoefficient: z.number().positive().optional(),
  /** false drops the per-wheel detail of each turn (large imported duty cycles). */
  turnDetail: z.boolean().default(true),
  /** Fitted wear coefficients (calibration); each overrides the same-named value above. */
  wearCoefficients: ZWearModelCoefficients.optional(),
});
export type TEstimateOptions = z.input<typeof ZEstimateOptions>;

// ---------------------------------------------------------------------------------------------
// Estimate result (output types only: produced by the engine, never parsed)
// ---------------------------------------------------------------------------------------------

export type TSeverity = "info" | "warning" | "error";

export type TWarningCode =
  | "lead-out-of-range"
  | "radius-infeasible"
  | "steer-input-infeasible"
  | "load-over-capacity"
  | "steering-mode-missing"
  | "designation-unparsed"
  | "solver-not-converged"
  | "tracks-wear-not-modelled"
  | "high-lateral-acceleration"
  | "traction-limit"
  | "outside-limits"
  | "option-not-applicable";

export interface TWarning {
  code: TWarningCode;
  severity: TSeverity;
  /** Plain-language explanation with the numbers involved. */
  message: string;
  /** Index into dutyCycle.turns when the warning concerns one turn kind. */
  turnIndex?: number;
  position?: TPosition;
}

/** A standing safety caution shown with every estimate. */
export interface TCaution {
  code: string;
  text: string;
}

/** One wheel in one turn (values for one occurrence of the turn). */
export interface TWheelTurnResult {
  position: TPosition;
  /** Road-wheel steer angle, positive = steered left (deg). */
  steerAngle: number;
  /** Slip angle, positive = wheel points left of its path (deg). */
  slipAngle: number;
  /** Path radius of the tyre contact centre about the turning centre (m); null in crab. */
  pathRadius: number | null;
  /** Lateral scrub (sliding) distance (m). */
  lateralScrub: number;
  /** Longitudinal scrub distance from lead, wind-up, locked differentials, skid slip (m). */
  longitudinalScrub: number;
  /** Frictional energy from lateral slip (J). */
  lateralEnergy: number;
  /** Frictional energy from longitudinal slip (J). */
  longitudinalEnergy: number;
  /** lateralEnergy + longitudinalEnergy (J). */
  energy: number;
}

/** One turn kind of the duty cycle. */
export interface TTurnResult {
  /** Index into dutyCycle.turns. */
  index: number;
  label: string;
  perHour: number;
  /** false when the machine cannot steer this tight: excluded from wear, see warnings. */
  feasible: boolean;
  /** Steering mode used. */
  steeringMode: TSteeringLayout;
  /** Path radius of the reference point (m); requested or resulting from steerInput. */
  radius: number;
  /** Steering input used: inner-wheel, articulation or crab angle (deg). */
  steerInput: number;
  /** Turning centre in the body frame (m), null in crab traverses. */
  turningCentre: { x: number; y: number } | null;
  /** Outer tyre contact path diameter (m), ISO 7457 / SAE J695 sense; null in crab. */
  turningDiameter: number | null;
  /** Lateral acceleration at the reference point (m/s²). */
  lateralAcceleration: number;
  /** Effective front-axle lead in this turn (fraction), null when not four-wheel driven. */
  effectiveLead: number | null;
  /** Skid steer: turning resistance moment (N·m), null otherwise. */
  turningMoment: number | null;
  /** Per-wheel detail; empty when options.turnDetail is false or the turn is infeasible. */
  wheels: TWheelTurnResult[];
  /** Frictional energy of one occurrence, all wheels (J). */
  energy: number;
}

/** Wear and cost of one wheel position over the duty cycle. */
export interface TPositionResult {
  position: TPosition;
  designation: string;
  /**
   * Frictional energy per operating hour (J/h): lateral turn scrub, longitudinal (wind-up,
   * locked differentials, skid slip), traction (drive/braking slip on roads, drawbar slip in
   * the field); total is their sum.
   */
  energyPerHour: { lateral: number; longitudinal: number; traction: number; total: number };
  /** Tread loss per 100 operating hours (mm): base rolling, turn scrub, traction slip. */
  wearPer100h: { base: number; scrub: number; traction: number; total: number };
  /** Wheel load relative to the tyre's rated load at its pressure (heavier side, mean of unladen/laden by distance). */
  loadRatio: number;
  /** Wear coefficient used (mm per MJ at abrasion 1) and whether it was calibrated. */
  wearCoefficient: { value: number; calibrated: boolean };
  /** Hours until the replacement depth; null when no wear is predicted. */
  hoursToReplacement: number | null;
  /** Tyre cost per operating hour at this position (dealership currency/h). */
  costPerHour: number;
  wearsFirst: boolean;
}

/** Suggested swap of two positions to even out wear. */
export interface TRotationAdvice {
  swap: [TPosition, TPosition];
  /** Operating hours after fitting at which to swap. */
  atHours: number;
  /** Life of the pair without and with the swap (h). */
  lifeWithout: number;
  lifeWith: number;
  note: string;
}

export interface TEstimateResult {
  engineVersion: string;
  machineName: string;
  dutyCycleName: string;
  /** Lead of the front axle in straight travel (fraction), null when not applicable. */
  lead: number | null;
  positions: TPositionResult[];
  turns: TTurnResult[];
  /** Position reaching replacement depth first; null when no wear. */
  firstToWear: TPosition | null;
  rotation: TRotationAdvice[];
  /** Sum over positions (dealership currency per operating hour). */
  costPerHour: number;
  warnings: TWarning[];
  cautions: TCaution[];
  /** Coefficient values used, for the record. */
  coefficients: Record<string, number>;
}
