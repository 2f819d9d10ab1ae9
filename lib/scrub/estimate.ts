import type { TDutyCycleInput, TEstimateOptions, TEstimateResult, TMachineInput } from "./schemas";

/** Estimate scrub, wear and tyre cost of a machine over a duty cycle. */
export function estimate(
  machine: TMachineInput,
  dutyCycle: TDutyCycleInput,
  options: TEstimateOptions = {},
): TEstimateResult {
  void machine;
  void dutyCycle;
  void options;
  throw new Error("estimate is not implemented yet");
}
