import type { TMachineInput } from "@/lib/scrub";
import type { TMachineRecordInput } from "@/features/machines/schemas/machine";
import { ZMachineRecordInput } from "@/features/machines/schemas/machine";
import { machineToSi } from "@/features/machines/lib/machine-units";
import { toNestedErrors } from "@/features/machines/lib/form-errors";
import type { TUnitSystem } from "@/lib/format/units";
import type { FieldErrors, Resolver } from "react-hook-form";

/** What the form holds: the machine in the user's display units; "" owner = dealership template. */
export type TMachineFormValues = { customerId: string; kind: string; spec: TMachineInput };

/** Display values → the API's record (SI), filling what the layout implies. */
export function toRecordInput(
  values: TMachineFormValues,
  system: TUnitSystem,
): TMachineRecordInput {
  const spec = machineToSi(values.spec, system);
  if (spec.steering?.layout === "articulated") {
    // Articulated machines take their wheelbase from the hinge distances.
    spec.wheelbase = (spec.steering.frontLength ?? 0) + (spec.steering.rearLength ?? 0);
  }
  return {
    customerId: values.customerId || null,
    kind: values.kind as TMachineRecordInput["kind"],
    spec,
  };
}

/**
 * Validates as the user types with the engine's own schema (through the record schema), after
 * converting to SI; messages come back in the user's units.
 */
export function machineFormResolver(system: TUnitSystem): Resolver<TMachineFormValues> {
  return async (values) => {
    const parsed = ZMachineRecordInput.safeParse(toRecordInput(values, system));
    if (parsed.success) return { values, errors: {} };
    return {
      values: {},
      errors: toNestedErrors(parsed.error, system) as FieldErrors<TMachineFormValues>,
    };
  };
}
