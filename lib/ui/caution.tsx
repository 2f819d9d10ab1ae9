import type { ReactNode } from "react";
import { cn } from "@/lib/ui/cn";

type Tone = "caution" | "danger" | "info";

const tones: Record<Tone, string> = {
  caution: "border-caution-300 bg-caution-50 text-caution-800",
  danger: "border-danger-600 bg-danger-50 text-danger-700",
  info: "border-furrow-200 bg-furrow-50 text-furrow-800",
};

/** A boxed notice for safety cautions and engine warnings. */
export function Caution({
  title,
  tone = "caution",
  children,
}: {
  title: string;
  tone?: Tone;
  children?: ReactNode;
}) {
  return (
    <div role="note" className={cn("rounded-md border-l-4 px-4 py-3 text-sm", tones[tone])}>
      <p className="font-medium">{title}</p>
      {children ? <div className="mt-1">{children}</div> : null}
    </div>
  );
}

/** The standing caution shown wherever an estimate is shown. */
export function EstimateSafetyCaution() {
  return (
    <Caution title="Estimates only: not load, pressure or speed advice">
      Treadcast gives engineering estimates of wear and cost. Load, inflation pressure and speed
      limits come from the tyre and machine makers&apos; data for the actual axle loads; follow
      them, local codes and trained tyre fitters&apos; practice. Mounting and inflating large tyres
      is hazardous work for trained technicians with a safety cage.
    </Caution>
  );
}
