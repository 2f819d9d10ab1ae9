"use client";

import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import {
  useFieldArray,
  useForm,
  useWatch,
  type Control,
  type FieldErrors,
  type UseFormRegister,
  type UseFormSetValue,
} from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { optionCautions, type TMachine, type TMachineChange } from "@/lib/scrub";
import type { TUnitSystem } from "@/lib/format/units";
import { currencySymbol, formatMoney } from "@/lib/format/format";
import { ApiError } from "@/lib/query/api-fetch";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCreateComparison } from "@/features/options/api/studies";
import { readChange, setupChoices, type TSetupChoice } from "@/features/options/lib/setup-choices";
import {
  ZSetupForm,
  type TSetupFormInput,
  type TSetupFormOutput,
} from "@/features/options/schemas/setup-form";

const MAX_OPTIONS = 4;

const initialValues = (choice: TSetupChoice | undefined) =>
  Object.fromEntries((choice?.fields ?? []).map((f) => [f.name, f.initial]));

const blankOption = (n: number, choice: TSetupChoice | undefined) => ({
  name: `Option ${n}`,
  oneOffCost: "0",
  changes: [{ key: choice?.key ?? "", values: initialValues(choice) }],
});

/**
 * "Try another setup": the dealer builds up to four options from changes that fit this
 * machine's layout, names each and enters its one-off cost; the engine compares them with
 * today's setup on the estimate's duty cycle and the result is stored.
 */
export function SetupForm({
  estimateId,
  machine,
  system,
  currency,
}: {
  estimateId: string;
  /** The estimate's frozen machine (SI). */
  machine: TMachine;
  system: TUnitSystem;
  /** The dealership's ISO 4217 currency. */
  currency: string;
}) {
  const router = useRouter();
  const choices = useMemo(() => setupChoices(machine, system), [machine, system]);
  const create = useCreateComparison();
  const [serverError, setServerError] = useState<string | null>(null);
  const form = useForm<TSetupFormInput, unknown, TSetupFormOutput>({
    resolver: zodResolver(ZSetupForm),
    defaultValues: {
      title: "",
      hours: "2000",
      options: [blankOption(1, choices[0]), blankOption(2, choices[1] ?? choices[0])],
    },
  });
  const { register, control, handleSubmit, setError, setValue, formState } = form;
  const options = useFieldArray({ control, name: "options" });

  const submit = handleSubmit(async (v) => {
    setServerError(null);
    let bad = false;
    const specs = v.options.map((o, i) => ({
      name: o.name,
      oneOffCost: o.oneOffCost,
      changes: o.changes.flatMap((c, j) => {
        const read = readChange(machine, system, c.key, c.values);
        if (read.ok) return [read.change];
        bad = true;
        for (const [field, message] of Object.entries(read.errors)) {
          setError(
            field === "key"
              ? `options.${i}.changes.${j}.key`
              : `options.${i}.changes.${j}.values.${field}`,
            { message },
          );
        }
        return [];
      }),
    }));
    if (bad) return;
    try {
      const created = await create.mutateAsync({
        estimateId,
        title: v.title || undefined,
        hours: v.hours,
        options: specs,
      });
      toast.success("Comparison ready");
      router.push(`/comparisons/${created.id}`);
    } catch (err) {
      const message = err instanceof Error ? err.message : "The comparison could not be run.";
      setServerError(message);
      if (err instanceof ApiError) {
        for (const [path, messages] of Object.entries(err.fieldErrors)) {
          if (/^options\.\d+\.(name|oneOffCost)$/.test(path) || path === "hours")
            setError(path as "hours", { message: messages[0] });
        }
      }
      toast.error(message);
    }
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Try another setup"
      className="flex flex-col gap-6"
    >
      <div className="grid max-w-3xl gap-4 sm:grid-cols-2">
        <Field
          label="Title"
          hint="Leave empty to name it after the machine."
          error={formState.errors.title?.message}
        >
          <Input {...register("title")} />
        </Field>
        <Field
          label="Total over"
          unit="operating hours"
          hint="Costs are added up over this many hours; payback is counted from hour 0."
          error={formState.errors.hours?.message}
        >
          <Input inputMode="decimal" {...register("hours")} />
        </Field>
      </div>

      {formState.errors.options?.root?.message || formState.errors.options?.message ? (
        <p role="alert" className="text-danger-700">
          {formState.errors.options?.root?.message ?? formState.errors.options?.message}
        </p>
      ) : null}

      <div className="grid gap-4 xl:grid-cols-2">
        {options.fields.map((field, i) => (
          <OptionCard
            key={field.id}
            index={i}
            control={control}
            register={register}
            setValue={setValue}
            errors={formState.errors}
            choices={choices}
            machine={machine}
            system={system}
            currency={currency}
            onRemove={options.fields.length > 1 ? () => options.remove(i) : undefined}
          />
        ))}
      </div>

      <div className="flex flex-wrap gap-3">
        {options.fields.length < MAX_OPTIONS ? (
          <Button
            variant="secondary"
            onClick={() => options.append(blankOption(options.fields.length + 1, choices[0]))}
          >
            Add an option
          </Button>
        ) : null}
        <Button type="submit" busy={create.isPending}>
          Compare with today&apos;s setup
        </Button>
      </div>
      {serverError ? (
        <p role="alert" className="text-danger-700" data-testid="setup-error">
          {serverError}
        </p>
      ) : null}
    </form>
  );
}

function OptionCard({
  index,
  control,
  register,
  setValue,
  errors,
  choices,
  machine,
  system,
  currency,
  onRemove,
}: {
  index: number;
  control: Control<TSetupFormInput, unknown, TSetupFormOutput>;
  register: UseFormRegister<TSetupFormInput>;
  setValue: UseFormSetValue<TSetupFormInput>;
  errors: FieldErrors<TSetupFormInput>;
  choices: TSetupChoice[];
  machine: TMachine;
  system: TUnitSystem;
  currency: string;
  onRemove?: () => void;
}) {
  const changes = useFieldArray({ control, name: `options.${index}.changes` });
  const watched = useWatch({ control, name: `options.${index}.changes` });
  const optionErrors = errors.options?.[index];
  // Cautions follow what the option touches, as the dealer builds it.
  const cautions = optionCautions(
    (watched ?? []).flatMap((c): TMachineChange[] => {
      const read = readChange(machine, system, c.key, c.values);
      return read.ok ? [read.change] : [];
    }),
  );
  return (
    <Card
      title={`Option ${index + 1}`}
      actions={
        onRemove ? (
          <Button variant="ghost" size="sm" onClick={onRemove}>
            Remove option {index + 1}
          </Button>
        ) : undefined
      }
    >
      <div className="flex flex-col gap-4" data-testid={`option-${index + 1}`}>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Name" error={optionErrors?.name?.message}>
            <Input {...register(`options.${index}.name`)} />
          </Field>
          <Field
            label="One-off cost"
            unit={currencySymbol(currency)}
            hint={`Parts, fitting and new tyres, in ${currency}; e.g. ${formatMoney(1250, currency)}.`}
            error={optionErrors?.oneOffCost?.message}
          >
            <Input inputMode="decimal" {...register(`options.${index}.oneOffCost`)} />
          </Field>
        </div>
        {optionErrors?.changes?.message || optionErrors?.changes?.root?.message ? (
          <p role="alert" className="text-sm text-danger-700">
            {optionErrors.changes.message ?? optionErrors.changes.root?.message}
          </p>
        ) : null}
        {changes.fields.map((c, j) => {
          const key = watched?.[j]?.key ?? c.key;
          const choice = choices.find((x) => x.key === key);
          const changeErrors = optionErrors?.changes?.[j];
          return (
            <fieldset key={c.id} className="rounded-md border border-ink-200 p-3">
              <legend className="px-1 text-sm font-medium text-ink-800">Change {j + 1}</legend>
              <div className="flex flex-col gap-3">
                <Field
                  label="What to change"
                  hint={choice?.hint}
                  error={changeErrors?.key?.message}
                >
                  <Select
                    {...register(`options.${index}.changes.${j}.key`, {
                      onChange: (e: React.ChangeEvent<HTMLSelectElement>) =>
                        setValue(
                          `options.${index}.changes.${j}.values`,
                          initialValues(choices.find((x) => x.key === e.target.value)),
                        ),
                    })}
                  >
                    <option value="">Choose a change</option>
                    {choices.map((x) => (
                      <option key={x.key} value={x.key}>
                        {x.label}
                      </option>
                    ))}
                  </Select>
                </Field>
                <div className="grid gap-3 sm:grid-cols-2">
                  {choice?.fields.map((f) => {
                    const name = `options.${index}.changes.${j}.values.${f.name}` as const;
                    const error = (
                      changeErrors?.values as Record<string, { message?: string }> | undefined
                    )?.[f.name]?.message;
                    const unit = f.name === "price" ? currencySymbol(currency) : f.unit;
                    return (
                      <Field
                        key={`${key}-${f.name}`}
                        label={f.label}
                        unit={unit || undefined}
                        hint={f.hint ?? (f.optional ? "Optional." : undefined)}
                        error={error}
                      >
                        {f.type === "select" ? (
                          <Select {...register(name)}>
                            {f.options?.map((o) => (
                              <option key={o.value} value={o.value}>
                                {o.label}
                              </option>
                            ))}
                          </Select>
                        ) : (
                          <Input
                            inputMode={f.type === "number" ? "decimal" : undefined}
                            {...register(name)}
                          />
                        )}
                      </Field>
                    );
                  })}
                </div>
                {changes.fields.length > 1 ? (
                  <Button
                    variant="ghost"
                    size="sm"
                    className="self-start"
                    onClick={() => changes.remove(j)}
                  >
                    Remove change {j + 1}
                  </Button>
                ) : null}
              </div>
            </fieldset>
          );
        })}
        {changes.fields.length < 10 ? (
          <Button
            variant="secondary"
            size="sm"
            className="self-start"
            onClick={() => changes.append({ key: "", values: {} })}
          >
            Add a change to option {index + 1}
          </Button>
        ) : null}
        {cautions.map((c) => (
          <Caution key={c.code} title={c.text} />
        ))}
      </div>
    </Card>
  );
}
