"use client";

import { useActionState, useState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { ROLE_LABELS } from "@/lib/authz/policy";
import type { TRole } from "@/lib/authz/actor";
import { FormMessage } from "@/features/auth/components/auth-frame";
import { inviteMemberAction } from "@/features/auth/server/actions/team-actions";
import { ChoiceOptions } from "@/lib/ui/choice-options";

const ROLE_HINTS: Record<TRole, string> = {
  dealer_admin: "Manages staff, invitations and settings.",
  estimator: "Builds machines, runs estimates and shares reports.",
  billing_admin: "Manages the plan and invoices.",
  customer: "Sees only their own machines, reports and comparisons.",
};

/** Invites a member of staff or a customer by e-mail. */
export function InviteForm({ customers }: { customers: { id: string; name: string }[] }) {
  const [state, action, pending] = useActionState(inviteMemberAction, undefined);
  const [role, setRole] = useState<TRole>("estimator");
  return (
    <form action={action} className="grid gap-4 sm:grid-cols-2" noValidate>
      <Field label="E-mail address" error={state?.fieldErrors?.email}>
        <Input name="email" type="email" autoComplete="off" required />
      </Field>
      <Field label="Role" hint={ROLE_HINTS[role]} error={state?.fieldErrors?.role}>
        <Select name="role" value={role} onChange={(e) => setRole(e.target.value as TRole)}>
          {(Object.keys(ROLE_LABELS) as TRole[]).map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </Select>
      </Field>
      {role === "customer" ? (
        <Field
          label="Customer record"
          hint="The account will see this customer's records and nothing else."
          error={state?.fieldErrors?.customerId}
        >
          <Select name="customerId" defaultValue="">
            <option value="" disabled>
              Choose a customer…
            </option>
            <ChoiceOptions choices={customers} />
          </Select>
        </Field>
      ) : null}
      <div className="flex flex-col gap-2 sm:col-span-2">
        {state?.message ? <FormMessage ok={state.ok}>{state.message}</FormMessage> : null}
        <Button type="submit" busy={pending} className="self-start">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
