import { forwardRef, type ButtonHTMLAttributes } from "react";
import { cn } from "@/lib/ui/cn";

type Variant = "primary" | "secondary" | "ghost" | "danger";
type Size = "sm" | "md";

const variants: Record<Variant, string> = {
  primary: "bg-furrow-600 text-white hover:bg-furrow-700 disabled:bg-ink-300",
  secondary: "bg-white text-ink-800 border border-ink-300 hover:bg-ink-100 disabled:text-ink-500",
  ghost: "text-furrow-700 hover:bg-furrow-50",
  danger: "bg-danger-600 text-white hover:bg-danger-700 disabled:bg-ink-300",
};

const sizes: Record<Size, string> = {
  // 44 px tall at md: a comfortable touch target with gloves on.
  sm: "h-9 px-3 text-sm",
  md: "h-11 px-4 text-base",
};

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: Variant;
  size?: Size;
  busy?: boolean;
};

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = "primary", size = "md", busy = false, className, disabled, children, type, ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      type={type ?? "button"}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={cn(
        "inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed",
        variants[variant],
        sizes[size],
        className,
      )}
      {...rest}
    >
      {busy ? (
        <span
          aria-hidden
          className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent"
        />
      ) : null}
      {children}
    </button>
  );
});
