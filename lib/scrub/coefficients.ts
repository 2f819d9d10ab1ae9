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

/**
 * Exponent n of the base-wear load factor (W/W_rated)^n [C from Archard, J value]: Archard's law
 * makes worn volume proportional to normal load × sliding distance, and the squirm sliding in
 * the contact patch grows with contact length, i.e. with deflection, which load–pressure tables
 * hold near constant at the rated load, so both factors scale with W/W_rated: n = 2. Override:
 * options.wearCoefficients.loadWearExponent.
 */
export const LOAD_WEAR_EXPONENT = 2;

/**
 * Load ratio W/W_rated at which BASE_WEAR_MM_PER_KM applies (a typical working load) [J]; the
 * base-wear load factor is (W/W_rated / LOAD_REFERENCE_RATIO)^n.
 */
export const LOAD_REFERENCE_RATIO = 0.7;

/**
 * Nominal rated load per tyre when neither a pressure rating nor a load capacity is entered:
 * W ≈ k·b·D (kg, b section width and D overall diameter in mm) with k = 0.004 kg/mm² [J]. The
 * value reproduces two load-index figures quoted from memory [M]: 380/85R28 133A8 ≈ 2060 kg
 * and 460/85R38 149A8 ≈ 3250 kg. Display and default only; the maker's table governs.
 */
export const NOMINAL_RATED_LOAD_PER_MM2 = 0.004;

/** Deflection at the rated load as a share of section height, radial ag tyres [trade practice, J]. */
export const RATED_DEFLECTION_RATIO = 0.2;

/**
 * Rolling-resistance coefficient against speed, f_r = 0.0136 + 0.40·10⁻⁷·V² (V in km/h), the
 * radial-ply form quoted in Wong, Theory of Ground Vehicles, ch. 1 [M: verify]. Drives the road
 * drive slip; ag tyres roll harder than the car tyres the formula was fitted to, so the base term
 * is scaled [J].
 */
export const ROLLING_RESISTANCE = { base: 0.0136, perKmh2: 0.4e-7, agTyreFactor: 2 } as const;

/** Mean |acceleration| of speeding up and braking in road and yard travel (m/s²) [J]. */
export const SPEED_CHANGE_ACCELERATION = 0.1;

/** Default cone index of the soil surfaces (kPa), ASABE D497 order of magnitude [M]. */
export const SOIL_CONE_INDEX = { "firm-soil": 1800, "loose-soil": 1200, grass: 1500 } as const;
