/**
 * The scrub and wear engine's one public entry. Pure computation: no I/O, no React, no database.
 * Conventions and formulas: docs/engine.md.
 */
export { ENGINE_VERSION } from "./version";
export * from "./schemas";
export { estimate } from "./estimate";

// Primitives (object arguments, SI units, degrees at the boundary).
export { idealSteerAngles } from "./ideal-steer-angles";
export { linkageOuterAngle } from "./linkage-outer-angle";
export { articulatedRadii } from "./articulated-radii";
export { tyreDimensions, type TTyreDimensions } from "./tyre-dimensions";
export { frontAxleLead, leadInTurn } from "./front-axle-lead";
export { brushTyre } from "./brush-tyre";
export { equilibriumTurn, type TEquilibriumWheelInput } from "./equilibrium-turn";
export {
  estimateRollingCircumference,
  nominalRollingCircumference,
  rollingCircumferenceIndex,
} from "./rolling-circumference";

// Steering comparison helpers.
export {
  angleErrorCurve,
  percentAckermann,
  PERCENT_ACKERMANN_DEFINITION,
  turningDiameter,
  type TAngleErrorPoint,
} from "./steering-comparison";

export { minimumTurningDiameter } from "./minimum-turning-diameter";

// Live checks of a machine profile being entered (the engine's lead and load checks).
export { profileChecks, type TPartialProfile, type TProfileChecks } from "./profile-checks";

// Defaults the UI may show next to user overrides.
export { DEFAULT_SURFACES } from "./surfaces";
export { cautionsFor, STANDING_CAUTIONS } from "./cautions";
export * as ENGINE_COEFFICIENTS from "./coefficients";

// Turn detection in telematics logs (docs/turn-detection.md).
export {
  segmentTurns,
  createTurnSegmenter,
  wrapDegrees,
  type TTurnSample,
  type TDetectedTurn,
  type TSegmentOptions,
  type TTurnSegmenter,
} from "./segment-turns";

// Options: variants, comparisons and sweeps (docs/engine.md, "Options").
export {
  applyChanges,
  parameterValue,
  ratedLoadAtPressure,
  PRESSURE_LOAD_EXPONENT,
  SWEEP_PARAMETERS,
  SWEEP_PARAMETER_UNITS,
  ZMachineChange,
  ZSweepParameter,
  type TMachineChange,
  type TSweepParameter,
} from "./machine-changes";
export {
  sweepParameter,
  ZSweepSpec,
  type TSweepPoint,
  type TSweepResult,
  type TSweepSpec,
} from "./sweep-parameter";
export {
  compareOptions,
  ZCompareSettings,
  ZOptionSpec,
  type TComparisonResult,
  type TOptionOutcome,
  type TOptionPosition,
  type TOptionSpec,
} from "./compare-options";
export { optionCautions } from "./option-cautions";
export { brixiusRatios, mobilityNumber, solveTractionSlip } from "./traction";
