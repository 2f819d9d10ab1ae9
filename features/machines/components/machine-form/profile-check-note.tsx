"use client";

import type { TWarning } from "@/lib/scrub";

/** One of the engine's machine checks, shown live beside the fields it concerns. */
export function ProfileCheckNote({ warning, testId }: { warning: TWarning; testId: string }) {
  const danger = warning.severity === "error";
  return (
    <p
      role="status"
      data-testid={testId}
      className={
        danger
          ? "rounded-md border-l-4 border-danger-600 bg-danger-50 px-3 py-2 text-sm text-danger-700"
          : "rounded-md border-l-4 border-caution-300 bg-caution-50 px-3 py-2 text-sm text-caution-800"
      }
    >
      {warning.message}
    </p>
  );
}
