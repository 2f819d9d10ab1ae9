import { toRadians } from "./angles";

/**
 * Lateral force of the isotropic brush model with parabolic pressure (Pacejka, Tire and Vehicle
 * Dynamics ch. 3 [M]; PHYSICS.md §5.5), as a function of σ = tan α:
 *   θ = C_α/(3 μ F_z);  F = μ F_z (3θ|σ| − 3(θσ)² + (θ|σ|)³) sign σ  for θ|σ| < 1, else μ F_z sign σ.
 * The solver loop (turn-solver.ts) inlines the same law together with its slope.
 */
export function brushForce(
  sigma: number,
  load: number,
  stiffness: number,
  friction: number,
): number {
  const muFz = friction * load;
  if (muFz <= 0) return 0;
  const t = (stiffness / (3 * muFz)) * Math.abs(sigma);
  const magnitude = t >= 1 ? muFz : muFz * (3 * t - 3 * t * t + t * t * t);
  return sigma < 0 ? -magnitude : magnitude;
}

/**
 * Brush tyre at slip angle `slip` (deg): lateral force (N, same sign as slip), fraction of the
 * contact length that slides (0..1), and frictional energy per metre travelled along the wheel
 * heading E' = |F|·|tan α| (J/m).
 */
export function brushTyre({
  load,
  corneringStiffness,
  friction,
  slip,
}: {
  /** Vertical load F_z (N). */
  load: number;
  /** Cornering stiffness C_α (N/rad). */
  corneringStiffness: number;
  /** Sliding friction coefficient μ. */
  friction: number;
  /** Slip angle α (deg), |α| < 90. */
  slip: number;
}): { lateralForce: number; slidingFraction: number; energyPerMetre: number } {
  if (!(load >= 0) || !(corneringStiffness > 0) || !(friction >= 0) || !(Math.abs(slip) < 90)) {
    throw new Error(
      "brushTyre: load ≥ 0 N, corneringStiffness > 0 N/rad, friction ≥ 0 and |slip| < 90°.",
    );
  }
  const sigma = Math.tan(toRadians(slip));
  const lateralForce = brushForce(sigma, load, corneringStiffness, friction);
  const muFz = friction * load;
  const slidingFraction =
    muFz > 0 ? Math.min(1, (corneringStiffness / (3 * muFz)) * Math.abs(sigma)) : 1;
  return { lateralForce, slidingFraction, energyPerMetre: Math.abs(lateralForce * sigma) };
}
