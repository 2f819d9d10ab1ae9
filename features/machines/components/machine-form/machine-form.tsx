"use client";

import { useRouter } from "next/navigation";
import { useDeferredValue, useMemo } from "react";
import { FormProvider, get, useForm, useWatch, type Path } from "react-hook-form";
import { profileChecks, ZMachine, type TSteeringLayout } from "@/lib/scrub";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { MACHINE_KINDS, type TMachineDto } from "@/features/machines/schemas/machine";
import { useCreateMachine, useUpdateMachine } from "@/features/machines/api/machines";
import { ApiError } from "@/lib/query/api-fetch";
import { FIELD_HELP } from "@/features/machines/lib/field-help";
import { machineFromSi } from "@/features/machines/lib/machine-units";
import { steeredAxles } from "@/features/machines/lib/steering-layouts";
import type { TUnitSystem } from "@/lib/format/units";
import { GeometryView } from "@/features/machines/components/geometry/geometry-view";
import { AxleFields } from "@/features/machines/components/machine-form/axle-fields";
import { DriveFields } from "@/features/machines/components/machine-form/drive-fields";
import { NumberField } from "@/features/machines/components/machine-form/number-field";
import { SteeringFields } from "@/features/machines/components/machine-form/steering-fields";
import { STARTER_SPEC } from "@/features/machines/components/machine-form/starter-spec";
import {
  machineFormResolver,
  toRecordInput,
  type TMachineFormValues,
} from "@/features/machines/components/machine-form/form-values";
import { ChoiceOptions } from "@/lib/ui/choice-options";

type Props = {
  machine?: TMachineDto;
  customers: { id: string; name: string }[];
  system: TUnitSystem;
  defaultCustomerId?: string;
  readOnly?: boolean;
};

/**
 * The machine profile form: adapts to the steering layout, shows the user's units, validates as
 * the user types with the engine's schema, and draws the geometry live beside it.
 */
export function MachineForm({
  machine,
  customers,
  system,
  defaultCustomerId,
  readOnly = false,
}: Props) {
  const router = useRouter();
  const create = useCreateMachine();
  const update = useUpdateMachine(machine?.id ?? "");
  const resolver = useMemo(() => machineFormResolver(system), [system]);
  const form = useForm<TMachineFormValues>({
    resolver,
    mode: "onChange",
    defaultValues: {
      customerId: machine ? (machine.customerId ?? "") : (defaultCustomerId ?? ""),
      kind: machine?.kind ?? "tractor",
      spec: machineFromSi(machine?.spec ?? STARTER_SPEC, system),
    },
  });
  const { register, handleSubmit, control, setError, formState } = form;
  const values = useWatch({ control }) as TMachineFormValues;
  const layout = values.spec?.steering?.layout as TSteeringLayout;
  const steered = steeredAxles(layout ?? "trapezoid");

  // The engine's lead and load checks, on whatever is filled in so far.
  const checks = useMemo(() => profileChecks(toRecordInput(values, system).spec), [values, system]);

  // The drawing follows the last valid machine; deferred so typing stays responsive.
  const deferred = useDeferredValue(values);
  const geometryMachine = useMemo(() => {
    const parsed = ZMachine.safeParse(toRecordInput(deferred, system).spec);
    return parsed.success ? parsed.data : null;
  }, [deferred, system]);

  const onSubmit = handleSubmit(async (formValues) => {
    const record = toRecordInput(formValues, system);
    try {
      const saved = machine ? await update.mutateAsync(record) : await create.mutateAsync(record);
      toast.success(machine ? "Machine saved" : "Machine added");
      if (!machine) router.push(`/machines/${saved.id}`);
    } catch (e) {
      if (e instanceof ApiError && Object.keys(e.fieldErrors).length > 0) {
        for (const [path, messages] of Object.entries(e.fieldErrors))
          setError(path as Path<TMachineFormValues>, { type: "server", message: messages[0] });
      }
      toast.error(e instanceof Error ? e.message : "The machine could not be saved.");
    }
  });

  const error = (name: string) =>
    (get(formState.errors, name) as { message?: string } | undefined)?.message;

  return (
    <FormProvider {...form}>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_440px]">
        <form
          onSubmit={onSubmit}
          noValidate
          className="flex flex-col gap-5"
          aria-label="Machine profile"
        >
          <fieldset disabled={readOnly} className="flex flex-col gap-5">
            <fieldset className="flex flex-col gap-4 rounded-lg border border-ink-200 p-4">
              <legend className="px-1 text-base font-medium text-ink-900">Machine</legend>
              <Field label="Name" hint={FIELD_HELP.name} error={error("spec.name")}>
                <Input autoComplete="off" {...register("spec.name")} />
              </Field>
              <div className="grid gap-4 sm:grid-cols-2">
                <Field label="Kind" hint={FIELD_HELP.kind} error={error("kind")}>
                  <Select {...register("kind")}>
                    {MACHINE_KINDS.map((k) => (
                      <option key={k} value={k}>
                        {k.replace("-", " ")}
                      </option>
                    ))}
                  </Select>
                </Field>
                <Field
                  label="Owner"
                  hint="The customer who runs it, or keep it as a dealership template to copy from."
                  error={error("customerId")}
                >
                  <Select {...register("customerId")}>
                    <option value="">Dealership template</option>
                    <ChoiceOptions choices={customers} />
                  </Select>
                </Field>
              </div>
            </fieldset>
            <SteeringFields system={system} />
            <AxleFields
              axle="front"
              steered={steered.includes("front")}
              system={system}
              capacity={checks.capacity.front}
            />
            <AxleFields
              axle="rear"
              steered={steered.includes("rear")}
              system={system}
              capacity={checks.capacity.rear}
            />
            <DriveFields system={system} checks={checks} />
            <fieldset className="flex flex-col gap-4 rounded-lg border border-ink-200 p-4">
              <legend className="px-1 text-base font-medium text-ink-900">
                Maker&apos;s figures
              </legend>
              <NumberField
                name="spec.limits.minTurningRadius"
                label="Smallest turning radius"
                system={system}
              />
            </fieldset>
          </fieldset>
          <Caution title="Loads and tyres">
            Axle loads and tyre load capacities must come from weighing the machine and from the
            tyre maker&apos;s load tables at the working pressure and speed. Treadcast only warns
            when a load looks too high; it does not set pressures or approve fitments.
          </Caution>
          {!readOnly ? (
            <div className="flex flex-wrap items-center gap-3">
              <Button type="submit" busy={formState.isSubmitting}>
                {machine ? "Save machine" : "Add machine"}
              </Button>
              {Object.keys(formState.errors).length > 0 ? (
                <p role="status" className="text-sm text-danger-700">
                  Some fields need fixing before the machine can be saved.
                </p>
              ) : null}
            </div>
          ) : null}
        </form>
        <Card title="Steering geometry" className="h-fit lg:sticky lg:top-4">
          {geometryMachine ? (
            <GeometryView machine={geometryMachine} system={system} />
          ) : (
            <p className="text-sm text-ink-700">
              Fill in the highlighted fields to see the machine&apos;s geometry.
            </p>
          )}
        </Card>
      </div>
    </FormProvider>
  );
}
