import { cloneElement, isValidElement, useId, type ReactElement, type ReactNode } from "react";

type FieldProps = {
  label: string;
  /** Plain trade words explaining the field; shown under the label. */
  hint?: ReactNode;
  error?: string;
  /** Unit shown after the control, e.g. "mm" or "in". */
  unit?: string;
  children: ReactElement<Record<string, unknown>>;
};

/** Label, control, hint and error text wired together for screen readers. */
export function Field({ label, hint, error, unit, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  const control = isValidElement(children)
    ? cloneElement(children, {
        id,
        "aria-describedby": describedBy,
        "aria-invalid": error ? true : undefined,
      })
    : children;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink-800">
        {label}
        {unit ? <span className="ml-1 font-normal text-ink-600">({unit})</span> : null}
      </label>
      {control}
      {hint ? (
        <p id={hintId} className="text-xs text-ink-600">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} role="alert" className="text-sm text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
