"use client";

import { get, useFormContext, useWatch } from "react-hook-form";
import type { TWarning } from "@/lib/scrub";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import type { TUnitSystem } from "@/lib/format/units";
import { NumberField } from "@/features/machines/components/machine-form/number-field";
import { TyreSizePreview } from "@/features/machines/components/machine-form/tyre-size-preview";
import type { TMachineFormValues } from "@/features/machines/components/machine-form/form-values";
import { ProfileCheckNote } from "@/features/machines/components/machine-form/profile-check-note";

/**
 * Track, loads and tyre fitment of one axle; the pivot track only when the axle steers. The
 * engine's load-over-capacity check shows under the tyre figures as soon as load and capacity
 * are both entered.
 */
export function AxleFields({
  axle,
  steered,
  system,
  capacity,
}: {
  axle: "front" | "rear";
  steered: boolean;
  system: TUnitSystem;
  /** The engine's load-over-capacity warnings for this axle. */
  capacity: TWarning[];
}) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<TMachineFormValues>();
  const base = `spec.axles.${axle}` as const;
  const designation = useWatch({ control, name: `${base}.tyre.designation` });
  const title = axle === "front" ? "Front axle" : "Rear axle";
  return (
    <fieldset
      className="flex flex-col gap-4 rounded-lg border border-ink-200 p-4"
      data-testid={`axle-${axle}`}
    >
      <legend className="px-1 text-base font-medium text-ink-900">
        {title}
        {steered ? <span className="ml-2 text-sm font-normal text-furrow-700">steered</span> : null}
      </legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField name={`${base}.track`} label="Track" system={system} />
        {steered ? (
          <NumberField name={`${base}.pivotTrack`} label="Steering pivot track" system={system} />
        ) : null}
        <NumberField name={`${base}.load`} label="Axle load, empty" system={system} />
        <NumberField name={`${base}.ladenLoad`} label="Axle load, laden" system={system} />
      </div>
      <div className="flex flex-col gap-2">
        <Field
          label="Tyre size"
          hint={FIELD_HELP.designation}
          error={
            (get(errors, `${base}.tyre.designation`) as { message?: string } | undefined)?.message
          }
        >
          <Input autoComplete="off" {...register(`${base}.tyre.designation`)} />
        </Field>
        <TyreSizePreview designation={designation ?? ""} system={system} />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField name={`${base}.tyre.treadDepthNew`} label="Lug depth, new" system={system} />
        <NumberField
          name={`${base}.tyre.treadDepthReplace`}
          label="Lug depth at replacement"
          system={system}
        />
        <NumberField name={`${base}.tyre.price`} label="Price per tyre" system={system} />
        <NumberField
          name={`${base}.tyre.loadCapacity`}
          label="Tyre load capacity"
          system={system}
        />
      </div>
      {capacity.map((w, i) => (
        <ProfileCheckNote key={i} warning={w} testId={`capacity-check-${axle}`} />
      ))}
      <details className="rounded-md bg-ink-50 p-3">
        <summary className="cursor-pointer text-sm font-medium text-ink-800">
          Data-book values (override the size&apos;s nominal dimensions)
        </summary>
        <div className="mt-3 grid gap-4 sm:grid-cols-3">
          <NumberField
            name={`${base}.tyre.overallDiameter`}
            label="Overall diameter"
            system={system}
          />
          <NumberField name={`${base}.tyre.sectionWidth`} label="Section width" system={system} />
          <NumberField
            name={`${base}.tyre.rollingCircumference`}
            label="Rolling circumference"
            system={system}
          />
        </div>
      </details>
    </fieldset>
  );
}
