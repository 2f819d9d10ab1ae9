import type { TMachineChange } from "./machine-changes";
import type { TCaution } from "./schemas";

const TYRES: TCaution = {
  code: "option-tyres",
  text: "Another tyre fitment: check the load index and speed symbol against the axle load at the working speed in the tyre maker's load–speed–pressure table, the rim's rating, and the rolling-circumference match (lead) in the machine maker's tyre list. Fitting large tyres is specialist work: use a trained tyre technician with a cage and remote inflation.",
};
const PRESSURE: TCaution = {
  code: "option-pressure",
  text: "Another inflation pressure: set it from the tyre maker's load–pressure table for the weighed axle load and speed, and raise field pressures before road travel. IF/VF tyres reach their rating only at the specified pressures.",
};
const LOAD: TCaution = {
  code: "option-load",
  text: "Another ballast or load: weigh the machine, keep each axle and tyre within its rated load, and check the machine maker's ballast limits and the stability of the machine with the load raised.",
};
const TRACK: TCaution = {
  code: "option-track",
  text: "Another track width: stay within the machine maker's track settings and wheel-offset limits, the road-width rules where the machine travels, and check clearance to the frame, mudguards and steering stops at full lock.",
};

/** Cautions that apply to a set of changes (each once). */
export function optionCautions(changes: readonly TMachineChange[]): TCaution[] {
  const out = new Map<string, TCaution>();
  for (const c of changes) {
    if (c.kind === "tyres") out.set(TYRES.code, TYRES);
    if (c.kind === "inflation" || (c.kind === "parameter" && c.parameter === "inflationPressure"))
      out.set(PRESSURE.code, PRESSURE);
    if (c.kind === "ballast") out.set(LOAD.code, LOAD);
    if (c.kind === "parameter" && (c.parameter === "frontTrack" || c.parameter === "rearTrack"))
      out.set(TRACK.code, TRACK);
    if (c.kind === "tyres" && c.inflation) out.set(PRESSURE.code, PRESSURE);
  }
  return [...out.values()];
}

/** Cautions for a swept parameter. */
export function parameterCautions(parameter: string): TCaution[] {
  if (parameter === "inflationPressure") return [PRESSURE];
  if (parameter === "frontTrack" || parameter === "rearTrack") return [TRACK];
  return [];
}
