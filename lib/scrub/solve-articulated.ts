import { DEG, toDegrees, toRadians } from "./angles";
import { articulatedRadii, articulationForRearRadius } from "./articulated-radii";
import { GRAVITY } from "./coefficients";
import { checkTurningRadius, collect } from "./collect-turn";
import type { PreparedMachine, PreparedMode } from "./machine-model";
import type { TTurn } from "./schemas";
import { infeasible, type TurnContext, type UnitTurn } from "./unit-turn";

/**
 * Articulated: each solid axle's spin axis passes through the turning centre, so there is no
 * slip at low speed (PHYSICS.md §2). Reference point = rear-axle centre. The speed term uses the
 * single-track approximation of §5.6 per axle (α = F/C, E' = F²/C). 4WD mismatch R_f/R_r − 1
 * enters through the wind-up model.
 */
export function articulatedTurn(
  pm: PreparedMachine,
  mode: PreparedMode,
  turn: TTurn,
  ctx: TurnContext,
  mirrored: boolean,
  mass: number,
): UnitTurn {
  if (mode.steering.layout !== "articulated") throw new Error("articulated mode expected");
  const { frontLength, rearLength } = mode.steering;
  let gamma: number;
  if (turn.radius !== undefined) {
    gamma =
      turn.radius > 0 ? articulationForRearRadius(frontLength, rearLength, turn.radius) : Math.PI;
    if (!(gamma <= mode.maxInput + 1e-9)) {
      return infeasible(
        mode,
        turn.radius,
        toDegrees(gamma),
        "radius-infeasible",
        `Radius ${turn.radius} m needs ${toDegrees(gamma).toFixed(1)}° of articulation; the machine allows ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
  } else {
    gamma = toRadians(turn.steerInput ?? 0);
    if (!(gamma > 0) || gamma > mode.maxInput + 1e-9) {
      return infeasible(
        mode,
        NaN,
        turn.steerInput ?? 0,
        "steer-input-infeasible",
        `Articulation ${turn.steerInput}° must be above 0° and within the machine's ${toDegrees(mode.maxInput).toFixed(1)}°.`,
      );
    }
  }
  const radii = articulatedRadii({ frontLength, rearLength, articulation: gamma / DEG });
  const w = mode.wheels;
  const omega2 = mass > 0 ? (turn.speed / radii.rear) ** 2 : 0;
  const axleRadius = [radii.front, radii.front, radii.rear, radii.rear];
  const halfTrack = [pm.front.track / 2, pm.front.track / 2, pm.rear.track / 2, pm.rear.track / 2];
  for (let i = 0; i < 4; i++) {
    const rho = (axleRadius[i] as number) + (i % 2 === 0 ? -1 : 1) * (halfTrack[i] as number);
    // Centripetal force share of this wheel: m_i ω² ρ_i; linear slip σ = F/C.
    const force = ((w.load[i] as number) / GRAVITY) * omega2 * rho;
    const sigma = force / (w.stiffness[i] as number);
    w.sigma[i] = sigma;
    w.force[i] = force;
    w.setSteer(i, i < 2 ? gamma : 0);
    w.rollingSpeed[i] = rho / Math.sqrt(1 + sigma * sigma);
    w.lateralSpeed[i] = (rho * sigma) / Math.sqrt(1 + sigma * sigma);
  }
  const result = collect(pm, mode, turn, ctx, mirrored, 1, "radian");
  result.radius = radii.rear;
  result.steerInput = toDegrees(gamma);
  result.centreX = 0;
  result.centreY = (mirrored ? -1 : 1) * radii.rear;
  result.lateralAcceleration = mass > 0 ? turn.speed ** 2 / radii.rear : 0;
  return checkTurningRadius(pm, result);
}
