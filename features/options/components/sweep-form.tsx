"use client";

import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { TMachine, TSweepParameter } from "@/lib/scrub";
import type { TUnitSystem } from "@/lib/format/units";
import { roundForInput } from "@/lib/format/units";
import { ApiError } from "@/lib/query/api-fetch";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCreateSweep } from "@/features/options/api/studies";
import {
  applicableParameters,
  PARAMETER_LABELS,
  parameterFromSi,
  parameterToSi,
  parameterUnit,
} from "@/features/options/lib/setup-choices";
import {
  readSweepForm,
  suggestedRange,
  type TSweepFormValues,
} from "@/features/options/lib/sweep-range";

/** Choose one setting and a range; the engine prices each value and the sweep is stored. */
export function SweepForm({
  estimateId,
  machine,
  system,
}: {
  estimateId: string;
  machine: TMachine;
  system: TUnitSystem;
}) {
  const router = useRouter();
  const create = useCreateSweep();
  const params = useMemo(() => applicableParameters(machine), [machine]);
  const first = params[0];
  const [serverError, setServerError] = useState<string | null>(null);
  const defaults = (parameter: TSweepParameter | undefined): TSweepFormValues => {
    const p = params.find((x) => x.parameter === parameter);
    if (!p) return { parameter: "", axle: "", from: "", to: "", points: "21", min: "", max: "" };
    const shown = parameterFromSi(system, p.parameter, p.current);
    const [from, to] = suggestedRange(p.parameter, shown);
    return {
      parameter: p.parameter,
      axle: "",
      from: String(roundForInput(from)),
      to: String(roundForInput(to)),
      points: "21",
      min: "",
      max: "",
    };
  };
  const { register, handleSubmit, control, reset, setError, formState } = useForm<TSweepFormValues>(
    { defaultValues: defaults(first?.parameter) },
  );
  const parameter = useWatch({ control, name: "parameter" }) as TSweepParameter | "";
  const current = params.find((p) => p.parameter === parameter);
  const unit = parameter ? parameterUnit(system, parameter) : "";

  const submit = handleSubmit(async (v) => {
    setServerError(null);
    const read = readSweepForm(v, (p, x) => parameterToSi(system, p, x));
    if (!read.ok) {
      for (const [field, message] of Object.entries(read.errors))
        setError(field as keyof TSweepFormValues, { message });
      return;
    }
    try {
      const created = await create.mutateAsync({ estimateId, sweep: read.sweep });
      toast.success("Sweep ready");
      router.push(`/sweeps/${created.id}`);
    } catch (err) {
      const message = err instanceof Error ? err.message : "The sweep could not be run.";
      setServerError(message);
      if (err instanceof ApiError) toast.error(message);
    }
  });

  if (params.length === 0)
    return (
      <p className="text-ink-700">
        None of the settings a sweep can vary applies to this machine as entered.
      </p>
    );

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Sweep a setting"
      className="flex max-w-3xl flex-col gap-4"
    >
      <Field
        label="Setting"
        hint={
          current
            ? `Today: ${roundForInput(parameterFromSi(system, current.parameter, current.current))}${unit ? ` ${unit}` : ""}.`
            : undefined
        }
        error={formState.errors.parameter?.message}
      >
        <Select
          {...register("parameter", {
            onChange: (e: React.ChangeEvent<HTMLSelectElement>) =>
              reset(defaults(e.target.value as TSweepParameter)),
          })}
        >
          {params.map((p) => (
            <option key={p.parameter} value={p.parameter}>
              {PARAMETER_LABELS[p.parameter]}
            </option>
          ))}
        </Select>
      </Field>
      {parameter === "inflationPressure" ? (
        <Field label="Axle">
          <Select {...register("axle")}>
            <option value="">Both axles</option>
            <option value="front">Front</option>
            <option value="rear">Rear</option>
          </Select>
        </Field>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="From" unit={unit || undefined} error={formState.errors.from?.message}>
          <Input inputMode="decimal" {...register("from")} />
        </Field>
        <Field label="To" unit={unit || undefined} error={formState.errors.to?.message}>
          <Input inputMode="decimal" {...register("to")} />
        </Field>
        <Field
          label="Points"
          hint="2 to 201 evenly spaced values."
          error={formState.errors.points?.message}
        >
          <Input inputMode="numeric" {...register("points")} />
        </Field>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Lowest allowed"
          unit={unit || undefined}
          hint="Optional: the machine maker's setting, a clearance or a road-width limit."
          error={formState.errors.min?.message}
        >
          <Input inputMode="decimal" {...register("min")} />
        </Field>
        <Field
          label="Highest allowed"
          unit={unit || undefined}
          hint="Optional. Values outside the limits are shown but never picked as best."
          error={formState.errors.max?.message}
        >
          <Input inputMode="decimal" {...register("max")} />
        </Field>
      </div>
      <Button type="submit" className="self-start" busy={create.isPending}>
        Run the sweep
      </Button>
      {serverError ? (
        <p role="alert" className="text-danger-700">
          {serverError}
        </p>
      ) : null}
    </form>
  );
}
