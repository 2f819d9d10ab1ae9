/**
 * Front-axle lead (overspeed) of a front-wheel-assist tractor [trade practice, PHYSICS.md §7.1]:
 *   λ = (RC_front · RM − RC_rear) / RC_rear
 * RM = front-axle revolutions per rear-axle revolution; RC = rolling circumference.
 */
export function frontAxleLead({
  frontCircumference,
  rearCircumference,
  gearRatio,
}: {
  /** Front tyre rolling circumference (any length unit, same as rear). */
  frontCircumference: number;
  rearCircumference: number;
  /** Front-axle revolutions per rear-axle revolution. */
  gearRatio: number;
}): number {
  if (!(frontCircumference > 0) || !(rearCircumference > 0) || !(gearRatio > 0)) {
    throw new Error("frontAxleLead: circumferences and gear ratio must be positive.");
  }
  return (frontCircumference * gearRatio - rearCircumference) / rearCircumference;
}

/**
 * Effective lead in an Ackermann turn (PHYSICS.md §7.2 [C]): the front axle (open differential)
 * must travel k = ½(ρ_fi + ρ_fo)/R times the rear-axle distance, ρ_f = √((R ∓ T_f/2)² + L²),
 * so λ_eff = (1 + λ)/k − 1.
 */
export function leadInTurn({
  lead,
  wheelbase,
  frontTrack,
  radius,
}: {
  /** Straight-line lead (fraction). */
  lead: number;
  /** m */
  wheelbase: number;
  /** Front tyre track (m). */
  frontTrack: number;
  /** Path radius of the rear-axle centre (m). */
  radius: number;
}): number {
  const inner = Math.hypot(radius - frontTrack / 2, wheelbase);
  const outer = Math.hypot(radius + frontTrack / 2, wheelbase);
  const requiredRatio = (inner + outer) / 2 / radius;
  return (1 + lead) / requiredRatio - 1;
}
