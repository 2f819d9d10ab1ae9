"use client";

import { useActionState, type ReactNode } from "react";
import { Button } from "@/lib/ui/button";
import type { TBillingActionState } from "@/features/billing/schemas/billing-action";

/** One billing action as a small form: hidden fields, a button, and the answer beside it. */
export function BillingActionForm({
  action,
  fields = {},
  label,
  variant = "primary",
  children,
}: {
  action: (prev: TBillingActionState | undefined, form: FormData) => Promise<TBillingActionState>;
  fields?: Record<string, string>;
  label: string;
  variant?: "primary" | "secondary" | "danger";
  children?: ReactNode;
}) {
  const [state, run, pending] = useActionState(action, undefined);
  return (
    <form action={run} className="flex flex-col gap-2">
      {Object.entries(fields).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {children}
      <div>
        <Button type="submit" variant={variant} busy={pending} size="sm">
          {label}
        </Button>
      </div>
      {state?.message ? (
        <p
          role={state.ok ? "status" : "alert"}
          className={state.ok ? "text-sm text-furrow-800" : "text-sm text-danger-700"}
        >
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
