"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useFieldArray, useForm, type Path } from "react-hook-form";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select, Textarea } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import {
  CUSTOMER_KINDS,
  ZCustomerInput,
  type TCustomerDto,
  type TCustomerInput,
  type TCustomerValues,
} from "@/features/customers/schemas/customer";
import { useCreateCustomer, useUpdateCustomer } from "@/features/customers/api/customers";
import { ApiError } from "@/lib/query/api-fetch";

const KIND_LABELS: Record<string, string> = {
  farm: "Farm",
  contractor: "Contractor",
  council: "Council or public body",
  estate: "Estate",
  utility: "Utility",
  other: "Other",
};

/** Create or edit a customer with its main contact, further contacts and notes. */
export function CustomerForm({ customer }: { customer?: TCustomerDto }) {
  const router = useRouter();
  const create = useCreateCustomer();
  const update = useUpdateCustomer(customer?.id ?? "");
  const form = useForm<TCustomerInput, unknown, TCustomerValues>({
    resolver: zodResolver(ZCustomerInput),
    mode: "onChange",
    defaultValues: {
      name: customer?.name ?? "",
      kind: (customer?.kind as TCustomerInput["kind"]) ?? "farm",
      contactName: customer?.contactName ?? "",
      contactEmail: customer?.contactEmail ?? "",
      contactPhone: customer?.contactPhone ?? "",
      contacts: customer?.contacts ?? [],
      notes: customer?.notes ?? "",
    },
  });
  const { register, handleSubmit, formState, control, setError } = form;
  const contacts = useFieldArray({ control, name: "contacts" });
  const errors = formState.errors;

  const onSubmit = handleSubmit(async (values) => {
    try {
      if (customer) {
        await update.mutateAsync(values);
        toast.success("Customer saved");
      } else {
        const created = await create.mutateAsync(values);
        toast.success("Customer added");
        router.push(`/customers/${created.id}`);
      }
    } catch (e) {
      if (e instanceof ApiError)
        for (const [path, messages] of Object.entries(e.fieldErrors))
          setError(path as Path<TCustomerInput>, { type: "server", message: messages[0] });
      toast.error(e instanceof Error ? e.message : "The customer could not be saved.");
    }
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex max-w-2xl flex-col gap-4"
      aria-label="Customer"
    >
      <Field
        label="Name"
        error={errors.name?.message}
        hint="As the customer trades, e.g. the farm or company name."
      >
        <Input autoComplete="organization" {...register("name")} />
      </Field>
      <Field label="Kind" error={errors.kind?.message}>
        <Select {...register("kind")}>
          {CUSTOMER_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Main contact" error={errors.contactName?.message}>
          <Input autoComplete="name" {...register("contactName")} />
        </Field>
        <Field label="E-mail" error={errors.contactEmail?.message}>
          <Input type="email" autoComplete="email" {...register("contactEmail")} />
        </Field>
        <Field label="Phone" error={errors.contactPhone?.message}>
          <Input type="tel" autoComplete="tel" {...register("contactPhone")} />
        </Field>
      </div>
      <fieldset className="flex flex-col gap-3 rounded-lg border border-ink-200 p-4">
        <legend className="px-1 text-sm font-medium text-ink-900">Further contacts</legend>
        {contacts.fields.map((f, i) => (
          <div key={f.id} className="grid items-end gap-3 sm:grid-cols-[1fr_1fr_1fr_1fr_auto]">
            <Field label="Name" error={errors.contacts?.[i]?.name?.message}>
              <Input {...register(`contacts.${i}.name`)} />
            </Field>
            <Field label="Role" error={errors.contacts?.[i]?.role?.message}>
              <Input {...register(`contacts.${i}.role`)} placeholder="e.g. workshop" />
            </Field>
            <Field label="E-mail" error={errors.contacts?.[i]?.email?.message}>
              <Input type="email" {...register(`contacts.${i}.email`)} />
            </Field>
            <Field label="Phone" error={errors.contacts?.[i]?.phone?.message}>
              <Input type="tel" {...register(`contacts.${i}.phone`)} />
            </Field>
            <Button
              variant="ghost"
              size="sm"
              onClick={() => contacts.remove(i)}
              aria-label={`Remove contact ${i + 1}`}
            >
              Remove
            </Button>
          </div>
        ))}
        <Button
          variant="secondary"
          size="sm"
          className="self-start"
          onClick={() => contacts.append({ name: "" })}
        >
          Add a contact
        </Button>
      </fieldset>
      <Field
        label="Notes"
        error={errors.notes?.message}
        hint="Anything the next person quoting should know."
      >
        <Textarea {...register("notes")} />
      </Field>
      <Button type="submit" className="self-start" busy={formState.isSubmitting}>
        {customer ? "Save customer" : "Add customer"}
      </Button>
    </form>
  );
}
