import { prepareMachine } from "./machine-model";
import { ZMachine, ZTurn, type TMachineInput, type TSteeringLayout } from "./schemas";
import { solveUnitTurn } from "./solve-turn";
import { DEFAULT_SURFACES } from "./surfaces";

/**
 * Smallest turning diameter of a machine in the ISO 7457 / SAE J695 sense: the path of the tyre
 * contact centre that describes the largest circle, on full lock at low speed (articulated:
 * full articulation; skid steer: pivot turn, "by calculation" as ISO 7457 allows). Null for crab
 * steering, which does not turn. Direction matters only for asymmetric loads.
 */
export function minimumTurningDiameter({
  machine,
  layout,
  direction = "left",
}: {
  machine: TMachineInput;
  layout?: TSteeringLayout;
  direction?: "left" | "right";
}): number | null {
  const parsed = ZMachine.parse(machine);
  const pm = prepareMachine(parsed);
  const mode = pm.modes.get(layout ?? pm.defaultLayout);
  if (!mode) throw new Error(`minimumTurningDiameter: the machine has no ${layout} steering mode.`);
  if (mode.layout === "crab") return null;
  const lock = (mode.maxInput * 180) / Math.PI;
  const turn = ZTurn.parse(
    mode.layout === "skid"
      ? { direction, radius: 0, headingChange: 360, speed: 0, surface: "concrete-asphalt" }
      : { direction, steerInput: lock, headingChange: 360, speed: 0, surface: "concrete-asphalt" },
  );
  const unit = solveUnitTurn(pm, mode, turn, {
    surface: DEFAULT_SURFACES["concrete-asphalt"],
    lead: null,
    longitudinalStiffnessCoefficient: 8,
  });
  return unit.feasible ? unit.turningDiameter : null;
}
