import type { ReactNode } from "react";

export function EmptyState({
  title,
  children,
  action,
}: {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-lg border border-dashed border-ink-300 bg-white px-6 py-10 text-center">
      <p className="text-lg font-medium text-ink-800">{title}</p>
      {children ? <div className="max-w-prose text-sm text-ink-600">{children}</div> : null}
      {action}
    </div>
  );
}
