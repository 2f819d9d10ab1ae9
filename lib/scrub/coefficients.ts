/**
 * Engine coefficients. Every value tagged [J] is a judgement placeholder with no published
 * value behind it: calibrate it from measured tread loss (docs/engine.md, "Calibration").
 * Values the user may override are listed in ZEstimateOptions or on the machine.
 */

/** Standard gravity (m/s²), to turn kg of axle load into N. */
export const GRAVITY = 9.80665;

/** Cornering stiffness per unit load C_α/F_z (1/rad); 3–8 is the starting range [M/J]. Per-axle override: tyre.corneringStiffnessCoefficient. */
export const CORNERING_STIFFNESS_COEFFICIENT = 5;

/** Lateral stiffness per unit load of a rubber track contact (1/rad) [J]: near-Coulomb sliding. */
export const TRACK_STIFFNESS_COEFFICIENT = 30;

/** Longitudinal slip stiffness per unit load C_x/F_z (per unit slip ratio) [J, PHYSICS.md §7.3]. Override: options.longitudinalStiffnessCoefficient. */
export const LONGITUDINAL_STIFFNESS_COEFFICIENT = 8;

/** Abradability γ (mm³ of tread per J of frictional energy); working range 2e-3–2e-2 [J, PHYSICS.md §6.4]. Override: options.abradability. */
export const ABRADABILITY = 5e-3;

/** Land/gross ratio of the loaded tread band, 0.2–0.3 for lugged tyres on hard ground [J]. Override: options.landRatio. */
export const LAND_RATIO = 0.25;

/** Tread contact width as a fraction of the section width [J]. */
export const TREAD_WIDTH_FRACTION = 0.85;

/** Base rolling wear on concrete/asphalt (mm of tread per km), scaled by surface abrasion [J]. Override: options.baseWearPerKm. */
export const BASE_WEAR_MM_PER_KM = 0.0015;

/** Skid steer effective-track factor χ = B_eff/B (longitudinal side slip) [M form, J value]. Override: steering.effectiveTrackFactor. */
export const SKID_EFFECTIVE_TRACK_FACTOR = 1.3;

/** Recommended front-axle lead band (fraction) [trade practice]. */
export const LEAD_RANGE = { min: 0.01, max: 0.05 } as const;

/** Lateral acceleration above which a turn is flagged for stability (m/s²) [J]. */
export const HIGH_LATERAL_ACCELERATION = 2;

/** Relative difference in wear rate between two swappable positions worth a rotation [J]. */
export const ROTATION_THRESHOLD = 0.1;
