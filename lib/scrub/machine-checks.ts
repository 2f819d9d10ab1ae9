import { LEAD_RANGE } from "./coefficients";
import { frontAxleLead } from "./front-axle-lead";
import type { PreparedMachine } from "./machine-model";
import type { TWarning } from "./schemas";

/** Coupled-axle lead λ (fraction) of the machine, null when front and rear are not coupled. */
export function machineLead(pm: PreparedMachine): number | null {
  const drive = pm.machine.drive;
  const f = pm.front.rollingCircumference;
  const r = pm.rear.rollingCircumference;
  if (drive.type === "front-assist") {
    return frontAxleLead({
      frontCircumference: f,
      rearCircumference: r,
      gearRatio: drive.gearRatio,
    });
  }
  if (drive.type === "4wd") return (f * drive.interAxleRatio - r) / r;
  return null;
}

export function isTracked(pm: PreparedMachine): boolean {
  return pm.machine.steering.layout === "skid" && pm.machine.steering.running === "tracked";
}

/** Machine-level warnings: lead band, tyre load capacity, unparsed sizes, tracks. */
export function checkMachine(pm: PreparedMachine, lead: number | null, warnings: TWarning[]): void {
  if (pm.machine.drive.type === "front-assist" && lead !== null) {
    if (lead < LEAD_RANGE.min || lead > LEAD_RANGE.max) {
      warnings.push({
        code: "lead-out-of-range",
        severity: "warning",
        message: `Front-axle lead is ${(lead * 100).toFixed(1)} %, outside the common ${LEAD_RANGE.min * 100}–${LEAD_RANGE.max * 100} % band: expect extra tyre and driveline wear. Check the tyre sizes against the tractor maker's lead table.`,
      });
    }
  }
  for (const axle of [pm.front, pm.rear]) {
    const capacity = axle.ratedLoadSource === "nominal" ? undefined : axle.ratedLoadKg;
    const at = axle.axle.inflation ? ` at ${axle.axle.inflation.pressure} kPa` : "";
    if (axle.designationUnparsed) {
      warnings.push({
        code: "designation-unparsed",
        severity: "info",
        message: `${axle.name} axle: size "${axle.designation}" was not recognised; the data-book diameter and width entered were used.`,
      });
    }
    if (capacity === undefined) continue;
    for (const [state, kg] of [
      ["unladen", axle.unladenKg],
      ["laden", axle.ladenKg],
    ] as const) {
      const wheelKg = kg * Math.max(axle.leftShare, 1 - axle.leftShare);
      if (wheelKg > capacity) {
        warnings.push({
          code: "load-over-capacity",
          severity: "error",
          message: `${axle.name} axle (${state}): ${wheelKg.toFixed(0)} kg per tyre exceeds the declared ${capacity} kg capacity${at}. Fit tyres rated for the load at the working speed and pressure, or raise the pressure within the tyre maker's table.`,
        });
        if (axle.ladenKg === axle.unladenKg) break;
      }
    }
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
