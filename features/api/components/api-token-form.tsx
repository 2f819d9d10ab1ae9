"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { API_SCOPES, SCOPE_LABELS } from "@/lib/authz/api-scopes";
import { createApiTokenAction } from "@/features/api/server/actions/api-token-actions";

const SCOPE_HINTS: Record<(typeof API_SCOPES)[number], string> = {
  read: "Customers, sites, machines, duty cycles, estimates and reports.",
  read_write: "Also create and change them, upload duty cycles and run estimates.",
  reports: "Read, issue and share quote reports (issuing counts against the plan).",
};

/** Makes a token; its secret appears once, below the form, with a copy button. */
export function ApiTokenForm() {
  const [state, action, pending] = useActionState(createApiTokenAction, undefined);
  return (
    <div className="flex flex-col gap-4">
      <form action={action} className="grid gap-4 sm:grid-cols-2" noValidate>
        <Field
          label="Name"
          hint="The system that will use it, e.g. “Workshop telematics export”."
          error={state?.fieldErrors?.name}
        >
          <Input name="name" autoComplete="off" maxLength={80} required />
        </Field>
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-medium text-ink-800">Scopes</legend>
          {API_SCOPES.map((scope) => (
            <label key={scope} className="flex items-start gap-2 text-sm">
              <input
                type="checkbox"
                name="scopes"
                value={scope}
                defaultChecked={scope === "read"}
                className="mt-1"
              />
              <span>
                {SCOPE_LABELS[scope]}
                <span className="block text-xs text-ink-600">{SCOPE_HINTS[scope]}</span>
              </span>
            </label>
          ))}
          {state?.fieldErrors?.scopes ? (
            <p role="alert" className="text-sm text-danger-700">
              {state.fieldErrors.scopes}
            </p>
          ) : null}
        </fieldset>
        <Field
          label="Expires after"
          unit="days"
          hint="Leave empty for a token that works until it is revoked."
          error={state?.fieldErrors?.expiresInDays}
        >
          <Input name="expiresInDays" type="number" min={1} max={730} inputMode="numeric" />
        </Field>
        <Field
          label="Rate limit"
          unit="requests per minute"
          hint="Past this, the API answers 429 with Retry-After."
          error={state?.fieldErrors?.requestsPerMinute}
        >
          <Input
            name="requestsPerMinute"
            type="number"
            min={1}
            max={6000}
            defaultValue={600}
            inputMode="numeric"
          />
        </Field>
        <div className="flex flex-col gap-2 sm:col-span-2">
          {state?.message && !state.secret ? (
            <p
              role={state.ok ? "status" : "alert"}
              className={
                state.ok
                  ? "rounded-md bg-ok-50 px-3 py-2 text-sm text-ok-700"
                  : "rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700"
              }
            >
              {state.message}
            </p>
          ) : null}
          <Button type="submit" busy={pending} className="self-start">
            Make token
          </Button>
        </div>
      </form>
      {state?.secret ? (
        <NewTokenSecret message={state.message ?? ""} secret={state.secret} />
      ) : null}
    </div>
  );
}

function NewTokenSecret({ message, secret }: { message: string; secret: string }) {
  return (
    <div role="status" className="flex flex-col gap-2 rounded-md bg-ok-50 px-3 py-3 text-sm">
      <p className="text-ok-700">{message}</p>
      <div className="flex flex-wrap items-center gap-2">
        <code
          data-testid="new-api-token"
          className="break-all rounded bg-white px-2 py-1 font-mono text-ink-900"
        >
          {secret}
        </code>
        <Button
          type="button"
          size="sm"
          variant="ghost"
          onClick={() => void navigator.clipboard?.writeText(secret)}
        >
          Copy
        </Button>
      </div>
      <p className="text-xs text-ink-700">
        Send it as <code>Authorization: Bearer …</code>. Treadcast keeps only a hash of it.
      </p>
    </div>
  );
}
