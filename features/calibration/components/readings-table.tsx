"use client";

import { Button } from "@/lib/ui/button";
import { toast } from "@/lib/ui/toast";
import { useDeleteReading } from "@/features/calibration/api/calibration";
import type { TReadingDto } from "@/features/calibration/schemas/reading";
import {
  formatDay,
  formatDepth,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";

/** Every reading, newest first, as a list that reads well on a phone. */
export function ReadingsTable({
  readings,
  system,
  canWrite,
}: {
  readings: readonly TReadingDto[];
  system: TUnitSystem;
  canWrite: boolean;
}) {
  const remove = useDeleteReading();
  if (readings.length === 0) return <p className="text-ink-700">No readings yet.</p>;
  return (
    <ul className="divide-y divide-ink-100" aria-label="Readings">
      {[...readings].reverse().map((r) => (
        <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
          <div>
            <p className="font-medium">
              {POSITION_NAMES[r.position]} · {formatDay(r.measuredOn)} ·{" "}
              {r.hourMeter.toLocaleString("en-GB")} h
              {r.kind === "fitted" ? ` · new tyre ${r.designation ?? ""}` : ""}
            </p>
            <p className="text-ink-700">
              inner {formatDepth(system, r.depthInner)} · centre{" "}
              {formatDepth(system, r.depthCentre)} · outer {formatDepth(system, r.depthOuter)} · by{" "}
              {r.measuredBy}
            </p>
            {r.photoIds.length ? (
              <p className="flex gap-2">
                {r.photoIds.map((id, i) => (
                  <a
                    key={id}
                    className="text-furrow-700 underline"
                    href={`/api/v1/reading-photos/${id}`}
                    target="_blank"
                    rel="noreferrer"
                  >
                    photo {i + 1}
                  </a>
                ))}
              </p>
            ) : null}
          </div>
          {canWrite ? (
            <Button
              variant="ghost"
              size="sm"
              onClick={() =>
                remove.mutate(r.id, {
                  onSuccess: () => toast.success("Reading deleted."),
                  onError: (e) => toast.error(e.message),
                })
              }
            >
              Delete
            </Button>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
