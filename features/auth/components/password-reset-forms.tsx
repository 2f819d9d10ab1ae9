"use client";

import { useActionState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { FormMessage } from "@/features/auth/components/auth-frame";
import { requestPasswordResetAction } from "@/features/auth/server/actions/sign-in-actions";
import { resetPasswordAction } from "@/features/auth/server/actions/reset-password-actions";

/** Asks for a reset link by e-mail. */
export function RequestResetForm() {
  const [state, action, pending] = useActionState(requestPasswordResetAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <Field label="E-mail address" error={state?.fieldErrors?.email}>
        <Input name="email" type="email" autoComplete="email" required />
      </Field>
      {state?.message && !state.fieldErrors ? (
        <FormMessage ok={state.ok}>{state.message}</FormMessage>
      ) : null}
      <Button type="submit" busy={pending}>
        Send reset link
      </Button>
    </form>
  );
}

/** Chooses a new password, from the token in an e-mailed link. */
export function NewPasswordForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState(resetPasswordAction, undefined);
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="token" value={token} />
      <Field
        label="New password"
        hint="At least 10 characters. A short sentence is easy to remember."
        error={state?.fieldErrors?.password}
      >
        <Input name="password" type="password" autoComplete="new-password" required />
      </Field>
      <Field label="New password again" error={state?.fieldErrors?.confirm}>
        <Input name="confirm" type="password" autoComplete="new-password" required />
      </Field>
      {state?.message && !state.fieldErrors ? (
        <FormMessage ok={state.ok}>{state.message}</FormMessage>
      ) : null}
      <Button type="submit" busy={pending}>
        Set new password
      </Button>
    </form>
  );
}
