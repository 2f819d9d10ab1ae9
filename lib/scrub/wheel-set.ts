/**
 * Preallocated per-wheel state for the turn solvers (structure of arrays, no allocation in the
 * Newton loops). Positions are tyre contact centres in the body frame (m), steer in rad,
 * load in N, stiffness in N/rad.
 */
export class WheelSet {
  readonly count: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly steer: Float64Array;
  /** sin δ and cos δ, written together with `steer` (saves trig calls in the solver loops). */
  readonly sinSteer: Float64Array;
  readonly cosSteer: Float64Array;
  /** dδ/dp: derivative of each steer angle with respect to the steering input p. */
  readonly steerSlope: Float64Array;
  readonly load: Float64Array;
  readonly stiffness: Float64Array;
  readonly friction: Float64Array;
  /** Outputs of the last evaluation. */
  readonly sigma: Float64Array;
  readonly force: Float64Array;
  /** Lateral slip velocity numerator N = V·(wheel lateral axis), sign as tan α (m/s). */
  readonly lateralSpeed: Float64Array;
  /** Velocity along the wheel heading (m/s). */
  readonly rollingSpeed: Float64Array;
  brush = true;

  constructor(count: number) {
    this.count = count;
    this.x = new Float64Array(count);
    this.y = new Float64Array(count);
    this.steer = new Float64Array(count);
    this.sinSteer = new Float64Array(count);
    this.cosSteer = new Float64Array(count).fill(1);
    this.steerSlope = new Float64Array(count);
    this.load = new Float64Array(count);
    this.stiffness = new Float64Array(count);
    this.friction = new Float64Array(count);
    this.sigma = new Float64Array(count);
    this.force = new Float64Array(count);
    this.lateralSpeed = new Float64Array(count);
    this.rollingSpeed = new Float64Array(count);
  }

  /** Set wheel i's steer angle (rad) with its sine and cosine. */
  setSteer(i: number, delta: number): void {
    this.steer[i] = delta;
    this.sinSteer[i] = Math.sin(delta);
    this.cosSteer[i] = Math.cos(delta);
  }

  /** Sum of μ·F_z (N): scale for force residuals. */
  frictionScale(): number {
    let s = 0;
    for (let i = 0; i < this.count; i++) s += (this.friction[i] ?? 0) * (this.load[i] ?? 0);
    return s > 0 ? s : 1;
  }
}
