import { cn } from "@/lib/ui/cn";

/** A labelled progress bar (0..1) that screen readers announce. */
export function ProgressBar({
  value,
  label,
  tone = "work",
}: {
  value: number;
  label: string;
  tone?: "work" | "done" | "failed";
}) {
  const pct = Math.round(Math.max(0, Math.min(1, value)) * 100);
  return (
    <div className="flex flex-col gap-1">
      <div className="flex justify-between text-sm text-ink-700">
        <span>{label}</span>
        <span>{pct} %</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        className="h-3 w-full overflow-hidden rounded-full bg-ink-200"
      >
        <div
          className={cn(
            "h-full rounded-full transition-[width] duration-300",
            tone === "failed" ? "bg-danger-600" : tone === "done" ? "bg-ok-700" : "bg-furrow-600",
          )}
          style={{ width: `${pct}%` }}
        />
      </div>
    </div>
  );
}
