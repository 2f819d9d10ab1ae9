"use client";

import { get, useFormContext } from "react-hook-form";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import { quantityOf } from "@/features/machines/lib/machine-units";
import { unitLabel, type TUnitSystem } from "@/lib/format/units";
import type { TMachineFormValues } from "@/features/machines/components/machine-form/form-values";

type Props = {
  name: string;
  label: string;
  system: TUnitSystem;
  /** Key into FIELD_HELP; defaults to the last part of the name. */
  help?: string;
  /** Unit shown when the field has no length or mass (deg, ratio...). */
  unit?: string;
  step?: string;
  disabled?: boolean;
};

/** A number input bound to the machine form, labelled in the user's units, with plain help. */
export function NumberField({ name, label, system, help, unit, step = "any", disabled }: Props) {
  const {
    register,
    formState: { errors },
  } = useFormContext<TMachineFormValues>();
  const specPath = name.replace(/^spec\./, "");
  const quantity = quantityOf(specPath);
  const shown = quantity === "none" ? unit : unitLabel(system, quantity);
  const helpKey = help ?? name.split(".").pop() ?? name;
  const error = (get(errors, name) as { message?: string } | undefined)?.message;
  return (
    <Field label={label} unit={shown} hint={FIELD_HELP[helpKey]} error={error}>
      <Input
        type="number"
        inputMode="decimal"
        step={step}
        disabled={disabled}
        {...register(name as "spec.wheelbase", { valueAsNumber: true })}
      />
    </Field>
  );
}
