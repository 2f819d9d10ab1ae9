import { LEAD_RANGE } from "./coefficients";
import { frontAxleLead } from "./front-axle-lead";
import type { PreparedMachine } from "./machine-model";
import type { TDrive, TWarning } from "./schemas";

/** Coupled-axle lead λ (fraction) of the machine, null when front and rear are not coupled. */
export function machineLead(pm: PreparedMachine): number | null {
  return coupledLead(pm.machine.drive, pm.front.rollingCircumference, pm.rear.rollingCircumference);
}

/** Lead of coupled axles from the drive and the two rolling circumferences (same unit). */
export function coupledLead(drive: TDrive, front: number, rear: number): number | null {
  if (drive.type === "front-assist") {
    return frontAxleLead({
      frontCircumference: front,
      rearCircumference: rear,
      gearRatio: drive.gearRatio,
    });
  }
  if (drive.type === "4wd") return (front * drive.interAxleRatio - rear) / rear;
  return null;
}

/** The lead-band warning of a front-assist machine, or null when the lead is in the band. */
export function leadWarning(drive: TDrive, lead: number | null): TWarning | null {
  if (drive.type !== "front-assist" || lead === null) return null;
  if (lead >= LEAD_RANGE.min && lead <= LEAD_RANGE.max) return null;
  return {
    code: "lead-out-of-range",
    severity: "warning",
    message: `Front-axle lead is ${(lead * 100).toFixed(1)} %, outside the common ${LEAD_RANGE.min * 100}–${LEAD_RANGE.max * 100} % band: expect extra tyre and driveline wear. Check the tyre sizes against the tractor maker's lead table.`,
  };
}

/** "1,800 kg": whole kilograms with the thousands separator, as every other mass is shown. */
const kgText = (kg: number) => `${Math.round(kg).toLocaleString("en-GB")} kg`;

/** One axle's loads against its tyres' declared capacity (heavier wheel, unladen and laden). */
export function capacityWarnings(axle: {
  name: "front" | "rear";
  unladenKg: number;
  ladenKg: number;
  leftShare: number;
  /** Declared capacity per tyre (kg); undefined when only the size's nominal rating is known. */
  capacityKg: number | undefined;
  /** Working pressure (kPa) the capacity holds at, when given. */
  pressure?: number;
}): TWarning[] {
  const out: TWarning[] = [];
  const capacity = axle.capacityKg;
  if (capacity === undefined) return out;
  const at = axle.pressure !== undefined ? ` at ${axle.pressure} kPa` : "";
  for (const [state, kg] of [
    ["unladen", axle.unladenKg],
    ["laden", axle.ladenKg],
  ] as const) {
    const wheelKg = kg * Math.max(axle.leftShare, 1 - axle.leftShare);
    if (wheelKg > capacity) {
      out.push({
        code: "load-over-capacity",
        severity: "error",
        message: `${axle.name} axle (${state}): ${kgText(wheelKg)} per tyre exceeds the declared ${kgText(capacity)} capacity${at}. Fit tyres rated for the load at the working speed and pressure, or raise the pressure within the tyre maker's table.`,
      });
      if (axle.ladenKg === axle.unladenKg) break;
    }
  }
  return out;
}

export function isTracked(pm: PreparedMachine): boolean {
  return pm.machine.steering.layout === "skid" && pm.machine.steering.running === "tracked";
}

/** Machine-level warnings: lead band, tyre load capacity, unparsed sizes, tracks. */
export function checkMachine(pm: PreparedMachine, lead: number | null, warnings: TWarning[]): void {
  const band = leadWarning(pm.machine.drive, lead);
  if (band) warnings.push(band);
  for (const axle of [pm.front, pm.rear]) {
    if (axle.designationUnparsed) {
      warnings.push({
        code: "designation-unparsed",
        severity: "info",
        message: `${axle.name} axle: size "${axle.designation}" was not recognised; the data-book diameter and width entered were used.`,
      });
    }
    warnings.push(
      ...capacityWarnings({
        name: axle.name,
        unladenKg: axle.unladenKg,
        ladenKg: axle.ladenKg,
        leftShare: axle.leftShare,
        capacityKg: axle.ratedLoadSource === "nominal" ? undefined : axle.ratedLoadKg,
        pressure: axle.axle.inflation?.pressure,
      }),
    );
  }
  if (isTracked(pm)) {
    warnings.push({
      code: "tracks-wear-not-modelled",
      severity: "info",
      message:
        "Tracked machine: turning energy and scrub are estimated, but track wear life and cost are not modelled.",
    });
  }
}
