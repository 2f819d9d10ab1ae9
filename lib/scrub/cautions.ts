import type { TCaution, TMachine, TSteeringLayout } from "./schemas";

/**
 * Standing safety cautions shown with every estimate (PHYSICS.md §10: trade practice and
 * judgement). Wording is Treadcast's own.
 */
export const STANDING_CAUTIONS: readonly TCaution[] = [
  {
    code: "estimate-only",
    text: "These figures are engineering estimates, not warranty, load or safety ratings. The tyre and machine makers' data, local rules and qualified tyre technicians decide every load, pressure and speed setting.",
  },
  {
    code: "load-speed-pressure",
    text: "Never run a tyre above its load index or ply rating for the actual speed. Weigh the machine and set pressures from the tyre maker's load–speed–pressure table; check again when ballast, implements or loaders change, and raise field pressures before road travel.",
  },
  {
    code: "speed-symbol",
    text: "Fit tyres whose speed symbol covers the machine's maximum design speed. IF/VF tyres reach their rating only at the specified pressures and on rims rated for them.",
  },
  {
    code: "lead-matching",
    text: "When changing tyre sizes or brands, keep front/rear rolling circumferences within the machine maker's lead specification and replace tyres in axle sets.",
  },
  {
    code: "mounting-hazard",
    text: "Mounting, inflating and rim work on large agricultural and industrial tyres can cause explosive separation: leave it to trained technicians using cages and remote inflation.",
  },
  {
    code: "stability",
    text: "Articulated, rear-steer and loader machines lose stability when steering with a raised load; rear-steer tail swing needs clearance.",
  },
];

/** Layouts whose machines steer by the frame or the rear, or carry raised loads while steering. */
const STABILITY_LAYOUTS: ReadonlySet<TSteeringLayout> = new Set([
  "articulated",
  "rear",
  "four-wheel",
  "crab",
  "skid",
]);

/**
 * The cautions that apply to this machine: the stability caution only where a layout it can
 * steer in is articulated, rear, four-wheel, crab or skid; the lead caution only when the front
 * axle is driven with a lead (lead not null). Every other standing caution always applies.
 */
export function cautionsFor(machine: TMachine, lead: number | null): TCaution[] {
  const layouts = [machine.steering, ...(machine.otherSteeringModes ?? [])].map((s) => s.layout);
  return STANDING_CAUTIONS.filter((c) => {
    if (c.code === "stability") return layouts.some((l) => STABILITY_LAYOUTS.has(l));
    if (c.code === "lead-matching") return lead !== null;
    return true;
  });
}
