import { capacityWarnings, coupledLead, leadWarning } from "./machine-checks";
import { estimateRollingCircumference } from "./rolling-circumference";
import { ZDrive, type TWarning } from "./schemas";
import { tyreDimensions } from "./tyre-dimensions";

/** A machine profile as it is being typed: any field may still be missing or not a number. */
export type TPartialProfile = {
  drive?: unknown;
  axles?: { front?: TPartialAxle; rear?: TPartialAxle };
  ballast?: { front?: unknown; rear?: unknown };
};
type TPartialAxle = {
  load?: unknown;
  ladenLoad?: unknown;
  leftShare?: unknown;
  tyre?: {
    designation?: unknown;
    overallDiameter?: unknown;
    rollingCircumference?: unknown;
    loadCapacity?: unknown;
  };
  inflation?: { pressure?: unknown; ratedLoad?: unknown };
};

export type TProfileChecks = {
  /** Front-axle lead in straight travel (fraction); null until both tyres and the drive are known, or when the axles are not coupled. */
  lead: number | null;
  /** The engine's lead-band warning, when the lead is outside it. */
  leadWarning: TWarning | null;
  /** The engine's load-over-capacity warnings per axle. */
  capacity: { front: TWarning[]; rear: TWarning[] };
};

const num = (v: unknown): number | undefined =>
  typeof v === "number" && Number.isFinite(v) ? v : undefined;
const positive = (v: unknown) => {
  const n = num(v);
  return n !== undefined && n > 0 ? n : undefined;
};

/** Rolling circumference (mm) as the engine would use it, or undefined while the tyre is unknown. */
function rollingCircumference(axle: TPartialAxle | undefined): number | undefined {
  const tyre = axle?.tyre;
  const given = positive(tyre?.rollingCircumference);
  if (given !== undefined) return given;
  let diameter = positive(tyre?.overallDiameter);
  if (diameter === undefined && typeof tyre?.designation === "string" && tyre.designation.trim()) {
    try {
      diameter = tyreDimensions(tyre.designation).overallDiameter;
    } catch {
      return undefined;
    }
  }
  return diameter === undefined ? undefined : estimateRollingCircumference(diameter);
}

/**
 * The engine's machine checks (lead band, load over tyre capacity) on a profile still being
 * entered, each as soon as the fields it needs are filled: the form shows them beside those
 * fields instead of waiting for an estimate. Same functions and messages as `estimate`.
 */
export function profileChecks(profile: TPartialProfile): TProfileChecks {
  const drive = ZDrive.safeParse(profile.drive);
  const front = rollingCircumference(profile.axles?.front);
  const rear = rollingCircumference(profile.axles?.rear);
  const lead =
    drive.success && front !== undefined && rear !== undefined
      ? coupledLead(drive.data, front, rear)
      : null;
  const capacity = (name: "front" | "rear"): TWarning[] => {
    const axle = profile.axles?.[name];
    const load = positive(axle?.load);
    if (!axle || load === undefined) return [];
    const ballast = num(profile.ballast?.[name]) ?? 0;
    const ratedLoad = positive(axle.inflation?.ratedLoad);
    return capacityWarnings({
      name,
      unladenKg: load + ballast,
      ladenKg: (positive(axle.ladenLoad) ?? load) + ballast,
      leftShare: num(axle.leftShare) ?? 0.5,
      capacityKg: ratedLoad ?? positive(axle.tyre?.loadCapacity),
      pressure: ratedLoad !== undefined ? positive(axle.inflation?.pressure) : undefined,
    });
  };
  return {
    lead,
    leadWarning: drive.success ? leadWarning(drive.data, lead) : null,
    capacity: { front: capacity("front"), rear: capacity("rear") },
  };
}
