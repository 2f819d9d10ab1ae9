"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { FormMessage } from "@/features/auth/components/auth-frame";
import {
  setDealershipCurrencyAction,
  setUnitSystemAction,
  switchDealershipAction,
} from "@/features/auth/server/actions/session-actions";

/** Unit preference, stored on the user and used by every page that shows measurements. */
export function UnitPreferenceForm({ unitSystem }: { unitSystem: "metric" | "imperial" }) {
  const [state, action, pending] = useActionState(setUnitSystemAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <Field
        label="Units"
        hint="Metric shows mm, kg, km/h and kPa; imperial shows in, lb, mph and psi."
        error={state?.fieldErrors?.unitSystem}
      >
        <Select name="unitSystem" defaultValue={unitSystem}>
          <option value="metric">Metric</option>
          <option value="imperial">Imperial</option>
        </Select>
      </Field>
      {state?.message && !state.fieldErrors ? (
        <FormMessage ok={state.ok}>{state.message}</FormMessage>
      ) : null}
      <Button type="submit" variant="secondary" busy={pending} className="self-start">
        Save units
      </Button>
    </form>
  );
}

/** Chooses which of the user's dealerships is active. */
export function ActiveDealershipForm({
  activeId,
  dealerships,
}: {
  activeId: string;
  dealerships: { id: string; name: string }[];
}) {
  const [state, action, pending] = useActionState(switchDealershipAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <Field label="Active dealership" hint="Everything you see and do applies to this dealership.">
        <Select name="dealershipId" defaultValue={activeId}>
          {dealerships.map((d) => (
            <option key={d.id} value={d.id}>
              {d.name}
            </option>
          ))}
        </Select>
      </Field>
      {state?.message ? <FormMessage ok={state.ok}>{state.message}</FormMessage> : null}
      <Button type="submit" variant="secondary" busy={pending} className="self-start">
        Switch dealership
      </Button>
    </form>
  );
}

/** Dealer admin: the dealership's currency, used for every amount shown and exported. */
export function DealershipCurrencyForm({ currency }: { currency: string }) {
  const [state, action, pending] = useActionState(setDealershipCurrencyAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <Field
        label="Currency"
        hint="Three-letter ISO 4217 code (GBP, EUR, USD…). Tyre prices are entered and shown in it; amounts already stored are not converted."
        error={state?.fieldErrors?.currency}
      >
        <Input name="currency" defaultValue={currency} maxLength={3} className="w-24 uppercase" />
      </Field>
      {state?.message && !state.fieldErrors ? (
        <FormMessage ok={state.ok}>{state.message}</FormMessage>
      ) : null}
      <Button type="submit" variant="secondary" busy={pending} className="self-start">
        Save currency
      </Button>
    </form>
  );
}
