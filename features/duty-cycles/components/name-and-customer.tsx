"use client";

import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { ChoiceOptions } from "@/lib/ui/choice-options";

/** The name of a new duty cycle, the customer it belongs to, and the server's refusal if any. */
export function NameAndCustomer({
  name,
  onName,
  customerId,
  onCustomer,
  customers,
  error,
}: {
  name: string;
  onName: (name: string) => void;
  customerId: string;
  onCustomer: (id: string) => void;
  customers: { id: string; name: string }[];
  error: Error | null;
}) {
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Duty cycle name">
          <Input value={name} maxLength={120} onChange={(e) => onName(e.target.value)} />
        </Field>
        <Field label="Customer">
          <Select value={customerId} onChange={(e) => onCustomer(e.target.value)}>
            <ChoiceOptions choices={customers} />
          </Select>
        </Field>
      </div>
      {error ? (
        <p role="alert" className="mt-3 text-sm text-danger-700">
          {error.message}
        </p>
      ) : null}
    </>
  );
}
