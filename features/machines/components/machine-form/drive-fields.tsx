"use client";

import { useFormContext, useWatch } from "react-hook-form";
import type { TDrive, TProfileChecks } from "@/lib/scrub";
import { Field } from "@/lib/ui/field";
import { Select } from "@/lib/ui/input";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import type { TUnitSystem } from "@/lib/format/units";
import { NumberField } from "@/features/machines/components/machine-form/number-field";
import type { TMachineFormValues } from "@/features/machines/components/machine-form/form-values";
import { ProfileCheckNote } from "@/features/machines/components/machine-form/profile-check-note";

const signedPercent = (fraction: number) =>
  `${fraction < 0 ? "−" : "+"}${Math.abs(fraction * 100).toLocaleString("en-GB", { minimumFractionDigits: 1, maximumFractionDigits: 1 })} %`;

const DRIVE_DEFAULTS: Record<TDrive["type"], TDrive> = {
  "2wd": { type: "2wd", drivenAxle: "rear" },
  // No invented gear ratio: it comes from the tractor maker's data and sets the lead.
  "front-assist": { type: "front-assist" } as TDrive,
  "4wd": { type: "4wd", interAxleRatio: 1 },
};

/**
 * Drive line. With coupled axles the front-axle lead is worked out live from the gear ratio and
 * the two tyre sizes (the engine's own lead and band check), before any estimate is run.
 */
export function DriveFields({
  system,
  checks,
}: {
  system: TUnitSystem;
  checks: Pick<TProfileChecks, "lead" | "leadWarning">;
}) {
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
      {type !== "2wd" ? (
        <p className="text-sm text-ink-700" data-testid="lead-check">
          Front-axle lead in straight travel:{" "}
          {checks.lead === null ? (
            <span className="text-ink-600">
              enter both tyre sizes and the {type === "4wd" ? "inter-axle" : "gear"} ratio
            </span>
          ) : (
            <span className="font-medium text-ink-900">{signedPercent(checks.lead)}</span>
          )}
        </p>
      ) : null}
      {checks.leadWarning ? (
        <ProfileCheckNote warning={checks.leadWarning} testId="lead-warning" />
      ) : null}
    </fieldset>
  );
}
