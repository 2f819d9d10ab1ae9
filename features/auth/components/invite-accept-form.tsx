"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { FormMessage } from "@/features/auth/components/auth-frame";
import { acceptInvitationAction } from "@/features/auth/server/actions/invite-actions";

/** Accepts an invitation; a new person also chooses a password here. */
export function InviteAcceptForm({
  token,
  email,
  needsPassword,
}: {
  token: string;
  email: string;
  needsPassword: boolean;
}) {
  const [state, action, pending] = useActionState(acceptInvitationAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <input type="hidden" name="needsPassword" value={needsPassword ? "1" : "0"} />
      <Field label="E-mail address" hint="The address the invitation was sent to.">
        <Input value={email} readOnly autoComplete="username" />
      </Field>
      <Field label="Your name" error={state?.fieldErrors?.name}>
        <Input name="name" autoComplete="name" required />
      </Field>
      {needsPassword ? (
        <>
          <Field
            label="Choose a password"
            hint="At least 10 characters. A short sentence is easy to remember."
            error={state?.fieldErrors?.password}
          >
            <Input name="password" type="password" autoComplete="new-password" required />
          </Field>
          <Field label="Password again" error={state?.fieldErrors?.confirm}>
            <Input name="confirm" type="password" autoComplete="new-password" required />
          </Field>
        </>
      ) : (
        <p className="text-sm text-ink-700">
          You already have a Treadcast account. After accepting, sign in as usual.
        </p>
      )}
      {state?.message && !state.fieldErrors ? (
        <FormMessage ok={state.ok}>{state.message}</FormMessage>
      ) : null}
      <Button type="submit" busy={pending}>
        Accept invitation
      </Button>
    </form>
  );
}
