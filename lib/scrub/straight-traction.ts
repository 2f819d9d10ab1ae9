import {
  GRAVITY,
  RATED_DEFLECTION_RATIO,
  ROLLING_RESISTANCE,
  SOIL_CONE_INDEX,
  SPEED_CHANGE_ACCELERATION,
} from "./coefficients";
import type { PreparedAxle, PreparedMachine } from "./machine-model";
import type { TStraightTravel, TSurfaceKind, TSurfaceProperties, TWarning } from "./schemas";
import { mobilityNumber, solveTractionSlip } from "./traction";

const SOILS = new Set<TSurfaceKind>(["firm-soil", "loose-soil", "grass"]);

/** Traction energy per metre of straight travel per wheel (J/m), positions in POSITIONS order. */
export type WheelEnergy = [number, number, number, number];

interface StateLoads {
  front: number;
  rear: number;
}

/** Axle loads (N) in one load state. */
function loadsN(pm: PreparedMachine, laden: boolean): StateLoads {
  return {
    front: (laden ? pm.front.ladenKg : pm.front.unladenKg) * GRAVITY,
    rear: (laden ? pm.rear.ladenKg : pm.rear.unladenKg) * GRAVITY,
  };
}

/** Which axles take drive torque in straight travel. */
export function drivenAxles(
  pm: PreparedMachine,
  frontDrive: "engaged" | "disengaged",
): { front: boolean; rear: boolean } {
  const drive = pm.machine.drive;
  if (drive.type === "4wd") return { front: true, rear: true };
  if (drive.type === "front-assist") return { front: frontDrive === "engaged", rear: true };
  return { front: drive.drivenAxle === "front", rear: drive.drivenAxle === "rear" };
}

/** Deflection ratio δ/h of a tyre at wheel load `wheelN`: the rated deflection scaled by W/W_rated [C]. */
export function deflectionRatio(axle: PreparedAxle, wheelN: number): number {
  return (RATED_DEFLECTION_RATIO * wheelN) / (axle.ratedLoadKg * GRAVITY);
}

function splitToWheels(out: WheelEnergy, axleIndex: 0 | 1, axle: PreparedAxle, energy: number) {
  const o = axleIndex * 2;
  out[o] = out[o]! + energy * axle.leftShare;
  out[o + 1] = out[o + 1]! + energy * (1 - axle.leftShare);
}

/**
 * Road and yard travel (hard surfaces): drive slip to overcome rolling resistance at speed,
 * f_r(V) [M: Wong], plus speeding up and braking (mean |a| [J]). Slip κ = F/C_x per axle, so
 * energy per metre F·κ = F²/C_x (PHYSICS §5.5). Drive force is shared by load among driven
 * axles; braking by load among all axles.
 */
export function roadTractionPerMetre(
  pm: PreparedMachine,
  speed: number,
  frontDrive: "engaged" | "disengaged",
  laden: boolean,
  stiffnessCoefficient: number,
  out: WheelEnergy,
): void {
  const loads = loadsN(pm, laden);
  const weight = loads.front + loads.rear;
  const kmh = speed * 3.6;
  const fr =
    ROLLING_RESISTANCE.agTyreFactor *
    (ROLLING_RESISTANCE.base + ROLLING_RESISTANCE.perKmh2 * kmh * kmh);
  const speedChange = ((weight / GRAVITY) * SPEED_CHANGE_ACCELERATION) / 2;
  const drive = fr * weight + speedChange;
  const driven = drivenAxles(pm, frontDrive);
  const drivenLoad = (driven.front ? loads.front : 0) + (driven.rear ? loads.rear : 0);
  ([0, 1] as const).forEach((i) => {
    const axle = i === 0 ? pm.front : pm.rear;
    const load = i === 0 ? loads.front : loads.rear;
    const isDriven = i === 0 ? driven.front : driven.rear;
    const cx = stiffnessCoefficient * load;
    const driveForce = isDriven && drivenLoad > 0 ? (drive * load) / drivenLoad : 0;
    const brakeForce = (speedChange * load) / weight;
    splitToWheels(out, i, axle, (driveForce * driveForce + brakeForce * brakeForce) / cx);
  });
}

/**
 * Field travel on soil with drawbar pull `pull` (N; 0 = free rolling): Brixius slip of the
 * driven axles (lib/scrub/traction.ts), energy per metre GT·W·s per driven axle (PHYSICS §6.7).
 * Returns false when the pull exceeds what the tyres can deliver.
 */
export function fieldTractionPerMetre(
  pm: PreparedMachine,
  surfaceKind: TSurfaceKind,
  surface: TSurfaceProperties,
  pull: number,
  frontDrive: "engaged" | "disengaged",
  laden: boolean,
  out: WheelEnergy,
): boolean {
  const loads = loadsN(pm, laden);
  const driven = drivenAxles(pm, frontDrive);
  const ci =
    surface.coneIndex ?? SOIL_CONE_INDEX[surfaceKind as keyof typeof SOIL_CONE_INDEX] ?? 1500;
  const axles = ([pm.front, pm.rear] as const).map((axle, i) => {
    const load = i === 0 ? loads.front : loads.rear;
    const wheelN = load / 2;
    const bn = mobilityNumber({
      coneIndex: ci,
      width: axle.sectionWidth / 1000,
      diameter: axle.overallDiameter / 1000,
      deflectionRatio: deflectionRatio(axle, wheelN),
      load: wheelN,
    });
    return { bn, load, driven: i === 0 ? driven.front : driven.rear };
  });
  const solution = solveTractionSlip(axles, pull);
  ([0, 1] as const).forEach((i) => {
    const axle = i === 0 ? pm.front : pm.rear;
    splitToWheels(out, i, axle, solution.grossForce[i]! * solution.slip);
  });
  return solution.withinTraction;
}

export function isSoil(kind: TSurfaceKind): boolean {
  return SOILS.has(kind);
}

/**
 * Traction energy per operating hour per wheel and surface of the straight travel, including
 * drawbar-work blocks. `add(wheel, surface, joules)` receives each contribution.
 */
export function straightTraction(
  pm: PreparedMachine,
  straight: TStraightTravel,
  surfaces: Record<TSurfaceKind, TSurfaceProperties>,
  surfaceKinds: readonly TSurfaceKind[],
  stiffnessCoefficient: number,
  warnings: TWarning[],
  add: (wheel: number, surface: TSurfaceKind, joules: number) => void,
): void {
  let shareSum = 0;
  for (const kind of surfaceKinds) shareSum += straight.surfaceShares[kind] ?? 0;
  if (!(shareSum > 0) || !(straight.distancePerHour > 0)) return;
  const mass = (laden: boolean) =>
    laden ? pm.front.ladenKg + pm.rear.ladenKg : pm.front.unladenKg + pm.rear.unladenKg;
  const states = [
    [false, 1 - straight.ladenShare],
    [true, straight.ladenShare],
  ] as const;
  for (const kind of surfaceKinds) {
    const surfaceDistance =
      (straight.distancePerHour * (straight.surfaceShares[kind] ?? 0)) / shareSum;
    let blockDistance = 0;
    for (const block of straight.drawbarWork) {
      if (block.surface !== kind) continue;
      const wanted = straight.distancePerHour * block.distanceShare;
      const distance = Math.min(wanted, Math.max(0, surfaceDistance - blockDistance));
      if (distance < wanted - 1e-9) {
        warnings.push({
          code: "traction-limit",
          severity: "warning",
          message: `Drawbar work "${block.label ?? kind}" covers more of the straight distance than its ${kind} share; only ${distance.toFixed(0)} m per hour of it is counted. Raise the ${kind} share of straight travel.`,
        });
      }
      blockDistance += distance;
      if (distance <= 0) continue;
      for (const [laden, part] of states) {
        if (part <= 0) continue;
        const pull = block.draught ?? (block.pullShare ?? 0) * mass(laden) * GRAVITY;
        const e: WheelEnergy = [0, 0, 0, 0];
        const ok = isSoil(kind)
          ? fieldTractionPerMetre(pm, kind, surfaces[kind], pull, "engaged", laden, e)
          : (roadTractionPerMetre(pm, straight.speed, "engaged", laden, stiffnessCoefficient, e),
            true);
        if (!ok) {
          warnings.push({
            code: "traction-limit",
            severity: "warning",
            message: `Drawbar work "${block.label ?? kind}": a pull of ${(pull / 1000).toFixed(1)} kN is more than the tyres can deliver on ${kind}; slip is held at the traction peak. Lighten the implement or add ballast.`,
          });
        }
        for (let w = 0; w < 4; w++) add(w, kind, e[w]! * distance * part);
      }
    }
    const rolling = surfaceDistance - blockDistance;
    if (rolling <= 0) continue;
    for (const [laden, part] of states) {
      if (part <= 0) continue;
      const e: WheelEnergy = [0, 0, 0, 0];
      if (isSoil(kind)) {
        fieldTractionPerMetre(pm, kind, surfaces[kind], 0, straight.frontDrive, laden, e);
      } else {
        roadTractionPerMetre(
          pm,
          straight.speed,
          straight.frontDrive,
          laden,
          stiffnessCoefficient,
          e,
        );
      }
      for (let w = 0; w < 4; w++) add(w, kind, e[w]! * rolling * part);
    }
  }
}
