import Link from "next/link";
import type { ReactNode } from "react";

/** A narrow centred frame for the signed-out pages (sign-in, invitation, password reset). */
export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center bg-ink-50 px-4 py-10">
      <Link href="/" className="mb-6 text-2xl font-bold text-furrow-700">
        Treadcast
      </Link>
      <main className="w-full max-w-md rounded-lg border border-ink-200 bg-white p-6 shadow-sm">
        <h1 className="mb-4 text-xl font-medium text-ink-900">{title}</h1>
        {children}
      </main>
    </div>
  );
}

/** A status line under a form: green for done, red for a problem. */
export function FormMessage({ ok, children }: { ok: boolean; children: ReactNode }) {
  return (
    <p
      role={ok ? "status" : "alert"}
      className={
        ok
          ? "rounded-md bg-ok-50 px-3 py-2 text-sm text-ok-700"
          : "rounded-md bg-danger-50 px-3 py-2 text-sm text-danger-700"
      }
    >
      {children}
    </p>
  );
}
