import type { ReactNode } from "react";

type DataTableShellProps = {
  caption: string;
  /** Toolbar above the table: filters, column visibility, actions. */
  toolbar?: ReactNode;
  head: ReactNode;
  body: ReactNode;
  footer?: ReactNode;
  empty?: ReactNode;
  isEmpty?: boolean;
};

/** Frame shared by every table: scrolls sideways on a phone instead of squashing columns. */
export function DataTableShell({
  caption,
  toolbar,
  head,
  body,
  footer,
  empty,
  isEmpty,
}: DataTableShellProps) {
  return (
    <div className="flex flex-col gap-3">
      {toolbar ? <div className="flex flex-wrap items-end gap-2">{toolbar}</div> : null}
      {isEmpty && empty ? (
        empty
      ) : (
        <div className="overflow-x-auto rounded-lg border border-ink-200 bg-white">
          <table className="min-w-full divide-y divide-ink-200 text-sm">
            <caption className="sr-only">{caption}</caption>
            <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
              {head}
            </thead>
            <tbody className="divide-y divide-ink-100">{body}</tbody>
          </table>
        </div>
      )}
      {footer ? (
        <div className="flex flex-wrap items-center justify-between gap-2 text-sm text-ink-700">
          {footer}
        </div>
      ) : null}
    </div>
  );
}
