"use client";

import { useFormContext, useWatch } from "react-hook-form";
import type { TDrive } from "@/lib/scrub";
import { Field } from "@/lib/ui/field";
import { Select } from "@/lib/ui/input";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import type { TUnitSystem } from "@/lib/format/units";
import { NumberField } from "@/features/machines/components/machine-form/number-field";
import type { TMachineFormValues } from "@/features/machines/components/machine-form/form-values";

const DRIVE_DEFAULTS: Record<TDrive["type"], TDrive> = {
  "2wd": { type: "2wd", drivenAxle: "rear" },
  "front-assist": { type: "front-assist", gearRatio: 1.3 },
  "4wd": { type: "4wd", interAxleRatio: 1 },
};

export function DriveFields({ system }: { system: TUnitSystem }) {
  const { register, setValue, control } = useFormContext<TMachineFormValues>();
  const type = useWatch({ control, name: "spec.drive.type" }) as TDrive["type"];
  const typeField = register("spec.drive.type", {
    onChange: (e: { target: { value: TDrive["type"] } }) =>
      setValue("spec.drive", DRIVE_DEFAULTS[e.target.value], {
        shouldValidate: true,
        shouldDirty: true,
      }),
  });
  return (
    <fieldset className="flex flex-col gap-4 rounded-lg border border-ink-200 p-4">
      <legend className="px-1 text-base font-medium text-ink-900">Drive</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Drive" hint={FIELD_HELP.driveType}>
          <Select {...typeField}>
            <option value="2wd">One driven axle</option>
            <option value="front-assist">Rear drive with front-wheel assist</option>
            <option value="4wd">Permanent four-wheel drive</option>
          </Select>
        </Field>
        {type === "2wd" ? (
          <Field label="Driven axle" hint={FIELD_HELP.drivenAxle}>
            <Select {...register("spec.drive.drivenAxle" as "spec.drive.type")}>
              <option value="rear">Rear</option>
              <option value="front">Front</option>
            </Select>
          </Field>
        ) : null}
        {type === "front-assist" ? (
          <NumberField
            name="spec.drive.gearRatio"
            label="Front axle gear ratio"
            unit="ratio"
            system={system}
          />
        ) : null}
        {type === "4wd" ? (
          <NumberField
            name="spec.drive.interAxleRatio"
            label="Inter-axle ratio"
            unit="ratio"
            system={system}
          />
        ) : null}
      </div>
    </fieldset>
  );
}
