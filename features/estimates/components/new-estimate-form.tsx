"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCreateEstimate } from "@/features/estimates/api/estimates";
import { useMachines } from "@/features/machines/client";
import { useCustomerSites } from "@/features/customers/client";
import { useDutyCycleChoices } from "@/features/estimates/api/duty-cycle-choices";
import { listState } from "@/lib/query/list-state";
import { ApiError } from "@/lib/query/api-fetch";
import { ChoiceOptions } from "@/lib/ui/choice-options";

/** Pick customer, machine, duty cycle and (optionally) site, then run the engine. */
export function NewEstimateForm({
  customers,
  defaultCustomerId,
  defaultMachineId,
  defaultDutyCycleId,
}: {
  customers: { id: string; name: string }[];
  defaultCustomerId?: string;
  defaultMachineId?: string;
  /** Preselected from a duty cycle's "Run an estimate with this duty cycle". */
  defaultDutyCycleId?: string;
}) {
  const router = useRouter();
  const [customerId, setCustomerId] = useState(defaultCustomerId ?? customers[0]?.id ?? "");
  const [machineId, setMachineId] = useState(defaultMachineId ?? "");
  const [dutyCycleId, setDutyCycleId] = useState(defaultDutyCycleId ?? "");
  const [siteId, setSiteId] = useState("");
  const [title, setTitle] = useState("");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const machines = useMachines(
    listState({ sort: "name", pageSize: 100, filters: customerId ? { customerId } : {} }),
  );
  const cycles = useDutyCycleChoices(customerId || null);
  const sites = useCustomerSites(customerId || null);
  const run = useCreateEstimate();

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setErrors({});
    try {
      const created = await run.mutateAsync({
        machineId,
        dutyCycleId,
        siteId: siteId || null,
        title: title || undefined,
      });
      toast.success("Estimate ready");
      router.push(`/estimates/${created.id}`);
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fieldErrors);
      toast.error(err instanceof Error ? err.message : "The estimate could not be run.");
    }
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      className="flex max-w-2xl flex-col gap-4"
      aria-label="New estimate"
    >
      <Field label="Customer">
        <Select
          value={customerId}
          onChange={(e) => {
            setCustomerId(e.target.value);
            setMachineId("");
            setDutyCycleId("");
            setSiteId("");
          }}
        >
          <ChoiceOptions choices={customers} />
        </Select>
      </Field>
      <Field
        label="Machine"
        error={errors.machineId?.[0]}
        hint={
          machines.isError ? `Machines could not be loaded: ${machines.error.message}` : undefined
        }
      >
        <Select value={machineId} onChange={(e) => setMachineId(e.target.value)}>
          <option value="">{machines.isPending ? "Loading…" : "Choose a machine"}</option>
          {machines.data?.items.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Duty cycle"
        error={errors.dutyCycleId?.[0]}
        hint={
          cycles.isError
            ? `Duty cycles could not be loaded: ${cycles.error.message}`
            : "Only duty cycles that have finished processing can be used."
        }
      >
        <Select value={dutyCycleId} onChange={(e) => setDutyCycleId(e.target.value)}>
          <option value="">{cycles.isPending ? "Loading…" : "Choose a duty cycle"}</option>
          {cycles.data?.map((d) => (
            <option key={d.id} value={d.id} disabled={d.status !== "ready"}>
              {d.name}
              {d.status !== "ready" ? ` (${d.status})` : ""}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Site"
        error={errors.siteId?.[0]}
        hint="Its surface mix is used for turns logged without a surface."
      >
        <Select value={siteId} onChange={(e) => setSiteId(e.target.value)}>
          <option value="">No site</option>
          {sites.data?.items.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Title"
        error={errors.title?.[0]}
        hint="Leave empty to name it after the machine and duty cycle."
      >
        <Input value={title} onChange={(e) => setTitle(e.target.value)} />
      </Field>
      <Button
        type="submit"
        className="self-start"
        busy={run.isPending}
        disabled={!machineId || !dutyCycleId}
      >
        Run estimate
      </Button>
    </form>
  );
}
