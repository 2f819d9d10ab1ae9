import type { TDutyCycleInput, TEstimateResult } from "@/lib/scrub";
import { calibrationAssumption, type TReportCalibration } from "@/lib/reports/calibration-note";

/** One assumption behind a report's figures and where it comes from. */
export type TAssumption = { topic: string; text: string; source: string };

const COEFFICIENTS: Record<string, { topic: string; text: (v: number) => string; source: string }> =
  {
    abradability: {
      topic: "Tread abradability",
      text: (v) => `${v} mm³ of tread lost per joule of frictional energy in the contact patch.`,
      source:
        "Energy–wear relation of Schallamach & Turner, Wear 3 (1960); the value is a placeholder within the 2e-3–2e-2 working range until calibrated from tread readings.",
    },
    baseWearPerKm: {
      topic: "Rolling wear",
      text: (v) =>
        `${v} mm of tread per km of travel on a hard surface, scaled by surface abrasion.`,
      source: "Judgement placeholder (no published value); calibrate from tread readings.",
    },
    landRatio: {
      topic: "Tread land ratio",
      text: (v) => `${v} of the loaded tread band is rubber in contact (lugged tyre).`,
      source: "Common practice for lugged agricultural tyres (0.2–0.3), no source.",
    },
    loadWearExponent: {
      topic: "Load and rolling wear",
      text: (v) =>
        `Rolling wear grows with the tyre's load relative to its rated load, to the power ${v}.`,
      source:
        "Archard's wear law (worn volume proportional to normal load × sliding distance), with contact-patch sliding taken to grow with deflection; the exponent is a judgement value until calibrated.",
    },
    longitudinalStiffnessCoefficient: {
      topic: "Longitudinal slip stiffness",
      text: (v) => `${v} per unit slip ratio, per unit wheel load.`,
      source:
        "Brush-model form from Pacejka, Tire and Vehicle Dynamics, ch. 3; value is a judgement placeholder.",
    },
  };

/** The assumptions listed in every report: model, coefficients as run, and the duty cycle. */
export function reportAssumptions(
  result: TEstimateResult,
  cycle: TDutyCycleInput,
  calibration: TReportCalibration | null = null,
): TAssumption[] {
  const out: TAssumption[] = [
    {
      topic: "Steering geometry",
      text: "Wheel headings and the turning centre follow from the machine's steering layout; where the headings do not share one centre, the tyres slide sideways (scrub) in proportion to their slip angles.",
      source:
        "Ackermann condition and low-speed turning force balance with cornering stiffness: Gillespie, Fundamentals of Vehicle Dynamics (SAE); turning diameters in the ISO 7457 / SAE J695 sense.",
    },
    {
      topic: "Tyre life and cost",
      text: "Life is the usable tread (new depth less replacement depth) divided by the predicted wear rate; cost per operating hour is the tyre price divided by its life.",
      source: "Common practice, no source.",
    },
  ];
  for (const [key, value] of Object.entries(result.coefficients)) {
    const known = COEFFICIENTS[key];
    out.push(
      known
        ? { topic: known.topic, text: known.text(value), source: known.source }
        : {
            topic: key,
            text: `Engine coefficient ${key} = ${value}.`,
            source: "Engine default; see the engine documentation.",
          },
    );
  }
  const calibrated = result.positions.some((p) => p.wearCoefficient.calibrated);
  out.push(calibrationAssumption(calibration, calibrated));
  out.push({
    topic: "Duty cycle",
    text: `One operating hour as described by the duty cycle "${cycle.name}": ${cycle.turns.length} kinds of turn and ${Math.round(cycle.straight.distancePerHour)} m of straight travel.`,
    source:
      "Supplied by the customer (telematics log or turn schedule) and reviewed by the dealership.",
  });
  return out;
}
