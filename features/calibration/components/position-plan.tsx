"use client";

import type { TTyrePosition } from "@/lib/calibration";
import { cn } from "@/lib/ui/cn";
import { POSITION_NAMES } from "@/features/calibration/components/format";

const LAYOUT: { position: TTyrePosition; area: string }[] = [
  { position: "front-left", area: "col-start-1 row-start-1" },
  { position: "front-right", area: "col-start-3 row-start-1" },
  { position: "rear-left", area: "col-start-1 row-start-3" },
  { position: "rear-right", area: "col-start-3 row-start-3" },
];

/**
 * The machine seen from above, front at the top: one large button per tyre, so a position is
 * picked with a thumb in the yard. A badge shows what each position already has.
 */
export function PositionPlan({
  value,
  onChange,
  badges = {},
  alerted = [],
}: {
  value: TTyrePosition;
  onChange: (p: TTyrePosition) => void;
  badges?: Partial<Record<TTyrePosition, string>>;
  alerted?: readonly TTyrePosition[];
}) {
  return (
    <div
      role="radiogroup"
      aria-label="Tyre position (machine seen from above, front at the top)"
      className="mx-auto grid w-full max-w-xs grid-cols-[1fr_5rem_1fr] grid-rows-[auto_2.5rem_auto] gap-2"
    >
      <div
        aria-hidden
        className="col-start-2 row-span-3 row-start-1 flex flex-col items-center justify-between rounded-md border-2 border-dashed border-ink-300 bg-ink-50 py-1 text-xs text-ink-600"
      >
        <span>▲ front</span>
        <span>rear</span>
      </div>
      {LAYOUT.map(({ position, area }) => {
        const selected = value === position;
        return (
          <button
            key={position}
            type="button"
            role="radio"
            aria-checked={selected}
            onClick={() => onChange(position)}
            className={cn(
              area,
              "flex min-h-20 flex-col items-center justify-center rounded-lg border-2 px-2 text-base font-medium",
              selected
                ? "border-furrow-600 bg-furrow-600 text-white"
                : "border-ink-300 bg-white text-ink-800 hover:bg-ink-100",
              alerted.includes(position) && !selected ? "border-danger-600" : "",
            )}
          >
            {POSITION_NAMES[position]}
            {badges[position] ? (
              <span className={cn("text-xs", selected ? "text-furrow-100" : "text-ink-600")}>
                {badges[position]}
              </span>
            ) : null}
          </button>
        );
      })}
    </div>
  );
}
