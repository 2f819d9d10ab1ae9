/**
 * Rolling circumference helpers.
 * - RCI relation of SAE J2523 (summary [S]): RCI = round(44·log10(RC/500)), RC in mm;
 *   nominal RC(RCI) = 500·10^(RCI/44), rounded to 5 mm.
 * - Estimate from the nominal diameter: RC ≈ k_rc·π·D (PHYSICS.md §8.3 [C from trade data]).
 */

/** RC/(π·D_nominal) for radial drive tyres; 0.953–0.963 back-calculated [C], mid value used [J]. */
export const ROLLING_CIRCUMFERENCE_FACTOR = 0.958;

export function rollingCircumferenceIndex(rollingCircumference: number): number {
  return Math.round(44 * Math.log10(rollingCircumference / 500));
}

export function nominalRollingCircumference(index: number): number {
  return Math.round((500 * 10 ** (index / 44)) / 5) * 5;
}

/** Estimated rolling circumference (mm) from the overall diameter (mm). */
export function estimateRollingCircumference(overallDiameter: number): number {
  return ROLLING_CIRCUMFERENCE_FACTOR * Math.PI * overallDiameter;
}
