"use client";

import Link from "next/link";
import { useActionState, useState } from "react";
import { Button } from "@/lib/ui/button";
import { Field } from "@/lib/ui/field";
import { Input } from "@/lib/ui/input";
import { cn } from "@/lib/ui/cn";
import { FormMessage } from "@/features/auth/components/auth-frame";
import type { TNotice } from "@/features/auth/schemas/sign-in-notice";
import {
  requestMagicLinkAction,
  signInWithPasswordAction,
} from "@/features/auth/server/actions/sign-in-actions";

type Mode = "password" | "link";

/** Sign in with a password, or have a one-time link e-mailed. */
export function SignInPanel({ callbackUrl, notice }: { callbackUrl: string; notice?: TNotice }) {
  const [mode, setMode] = useState<Mode>("password");
  const [pwState, pwAction, pwPending] = useActionState(signInWithPasswordAction, undefined);
  const [linkState, linkAction, linkPending] = useActionState(requestMagicLinkAction, undefined);
  const tab = (m: Mode, label: string) => (
    <button
      type="button"
      role="tab"
      aria-selected={mode === m}
      onClick={() => setMode(m)}
      className={cn(
        "h-10 flex-1 rounded-md text-sm font-medium",
        mode === m ? "bg-white text-furrow-800 shadow-sm" : "text-ink-700 hover:text-ink-900",
      )}
    >
      {label}
    </button>
  );
  return (
    <div className="flex flex-col gap-4">
      {notice ? <FormMessage ok={notice.ok}>{notice.text}</FormMessage> : null}
      <div
        role="tablist"
        aria-label="How to sign in"
        className="flex gap-1 rounded-lg bg-ink-100 p-1"
      >
        {tab("password", "Password")}
        {tab("link", "E-mail me a link")}
      </div>
      {mode === "password" ? (
        <form action={pwAction} className="flex flex-col gap-4" noValidate>
          <input type="hidden" name="callbackUrl" value={callbackUrl} />
          <Field label="E-mail address" error={pwState?.fieldErrors?.email}>
            <Input name="email" type="email" autoComplete="username" required />
          </Field>
          <Field label="Password" error={pwState?.fieldErrors?.password}>
            <Input name="password" type="password" autoComplete="current-password" required />
          </Field>
          {pwState && !pwState.ok && !pwState.fieldErrors ? (
            <FormMessage ok={false}>{pwState.message}</FormMessage>
          ) : null}
          <Button type="submit" busy={pwPending}>
            Sign in
          </Button>
          <Link href="/reset-password" className="text-sm text-furrow-700 hover:underline">
            Forgot your password?
          </Link>
        </form>
      ) : (
        <form action={linkAction} className="flex flex-col gap-4" noValidate>
          <input type="hidden" name="callbackUrl" value={callbackUrl} />
          <Field
            label="E-mail address"
            hint="We send a link that signs you in once."
            error={linkState?.fieldErrors?.email}
          >
            <Input name="email" type="email" autoComplete="email" required />
          </Field>
          {linkState?.message && !linkState.fieldErrors ? (
            <FormMessage ok={linkState.ok}>{linkState.message}</FormMessage>
          ) : null}
          <Button type="submit" busy={linkPending}>
            Send sign-in link
          </Button>
        </form>
      )}
    </div>
  );
}
