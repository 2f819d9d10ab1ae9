"use client";

import { get, useFormContext, useWatch } from "react-hook-form";
import { STEERING_LAYOUTS, type TSteering, type TSteeringLayout } from "@/lib/scrub";
import { Field } from "@/lib/ui/field";
import { Select } from "@/lib/ui/input";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import {
  defaultSteering,
  LAYOUT_LABELS,
  steeringFields,
  usesWheelbase,
} from "@/features/machines/lib/steering-layouts";
import { steeringFromSi } from "@/features/machines/lib/machine-units";
import type { TUnitSystem } from "@/lib/format/units";
import { NumberField } from "@/features/machines/components/machine-form/number-field";
import type { TMachineFormValues } from "@/features/machines/components/machine-form/form-values";

const NUMBER_LABELS: Record<string, { label: string; unit?: string }> = {
  maxLock: { label: "Full-lock angle", unit: "°" },
  armLength: { label: "Steering arm length" },
  armAngle: { label: "Steering arm angle", unit: "°" },
  frontLength: { label: "Hinge to front axle" },
  rearLength: { label: "Hinge to rear axle" },
  maxArticulation: { label: "Full articulation angle", unit: "°" },
  rearRatio: { label: "Rear-to-front steer ratio", unit: "ratio" },
  contactLength: { label: "Track length on the ground" },
  effectiveTrackFactor: { label: "Skid slip allowance", unit: "factor" },
};

const CHOICES: Record<string, { label: string; options: [string, string][] }> = {
  tieRod: {
    label: "Track rod position",
    options: [
      ["behind", "Behind the axle"],
      ["ahead", "Ahead of the axle"],
    ],
  },
  wheelAngles: {
    label: "Wheel angles on each axle",
    options: [
      ["ackermann", "Ackermann (inside wheel turns more)"],
      ["parallel", "Equal angles"],
    ],
  },
  running: {
    label: "Running gear",
    options: [
      ["wheeled", "Wheels"],
      ["tracked", "Tracks"],
    ],
  },
};

const EXTRA_MODES: TSteeringLayout[] = ["four-wheel", "crab", "trapezoid", "parallel", "rear"];

/** Layout picker and only the measurements that layout needs; switching layout resets its values. */
export function SteeringFields({ system }: { system: TUnitSystem }) {
  const {
    register,
    setValue,
    getValues,
    control,
    formState: { errors },
  } = useFormContext<TMachineFormValues>();
  const layout = useWatch({ control, name: "spec.steering.layout" }) as TSteeringLayout;
  const others = (useWatch({ control, name: "spec.otherSteeringModes" }) ?? []) as TSteering[];
  const layoutField = register("spec.steering.layout", {
    onChange: (e: { target: { value: string } }) => {
      const next = e.target.value as TSteeringLayout;
      const current = getValues("spec.steering") as TSteering;
      setValue("spec.steering", steeringFromSi(defaultSteering(next, current), system), {
        shouldValidate: true,
        shouldDirty: true,
      });
      setValue(
        "spec.otherSteeringModes",
        others.filter((m) => m.layout !== next),
        { shouldDirty: true },
      );
    },
  });

  const toggleMode = (mode: TSteeringLayout, on: boolean) => {
    const main = getValues("spec.steering") as TSteering;
    const next = on
      ? [...others, steeringFromSi(defaultSteering(mode, main), system)]
      : others.filter((m) => m.layout !== mode);
    setValue("spec.otherSteeringModes", next, { shouldValidate: true, shouldDirty: true });
  };

  return (
    <fieldset
      className="flex flex-col gap-4 rounded-lg border border-ink-200 p-4"
      data-testid="steering-fields"
    >
      <legend className="px-1 text-base font-medium text-ink-900">Steering</legend>
      <Field label="Steering layout" hint={FIELD_HELP.layout}>
        <Select {...layoutField}>
          {STEERING_LAYOUTS.map((l) => (
            <option key={l} value={l}>
              {LAYOUT_LABELS[l]}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        {usesWheelbase(layout) ? (
          <NumberField name="spec.wheelbase" label="Wheelbase" system={system} />
        ) : null}
        {steeringFields(layout).map((field) => {
          const name = `spec.steering.${field}`;
          const choice = CHOICES[field];
          if (choice) {
            return (
              <Field
                key={field}
                label={choice.label}
                hint={FIELD_HELP[field]}
                error={(get(errors, name) as { message?: string } | undefined)?.message}
              >
                <Select {...register(name as "spec.steering.layout")}>
                  {choice.options.map(([value, text]) => (
                    <option key={value} value={value}>
                      {text}
                    </option>
                  ))}
                </Select>
              </Field>
            );
          }
          const meta = NUMBER_LABELS[field] ?? { label: field };
          return (
            <NumberField
              key={field}
              name={name}
              label={meta.label}
              unit={meta.unit}
              system={system}
            />
          );
        })}
      </div>
      {layout !== "skid" && layout !== "articulated" ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="text-sm font-medium text-ink-800">
            Other steering modes the machine can select
          </legend>
          <div className="flex flex-wrap gap-x-5 gap-y-2">
            {EXTRA_MODES.filter((m) => m !== layout).map((m) => (
              <label key={m} className="flex items-center gap-2 text-sm text-ink-800">
                <input
                  type="checkbox"
                  className="size-4"
                  checked={others.some((o) => o.layout === m)}
                  onChange={(e) => toggleMode(m, e.target.checked)}
                />
                {LAYOUT_LABELS[m]}
              </label>
            ))}
          </div>
        </fieldset>
      ) : null}
    </fieldset>
  );
}
