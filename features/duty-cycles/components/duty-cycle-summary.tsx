"use client";

import type { TDutyCycleSummary } from "@/lib/duty-cycles/summarise";
import { SURFACE_LABELS } from "@/lib/duty-cycles/surface-names";
import { formatPerHour } from "@/lib/format/format";
import { SummaryBarChart } from "@/features/duty-cycles/components/summary-bar-chart";

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <div className="rounded-md border border-ink-200 bg-white px-4 py-3">
      <dt className="text-xs uppercase tracking-wide text-ink-600">{label}</dt>
      <dd className="mt-1 text-xl font-medium text-ink-900">{value}</dd>
    </div>
  );
}

/** Speed bands of 2 km/h-ish are too fine to read: group them in 5 km/h steps up to 40. */
function speedBars(summary: TDutyCycleSummary) {
  const step = 5;
  const bars: { label: string; value: number }[] = [];
  for (let from = 0; from < 40; from += step) {
    const to = from + step;
    const share = summary.speedDistribution
      .filter((b) => b.from * 3.6 >= from - 1e-9 && b.from * 3.6 < to - 1e-9)
      .reduce((s, b) => s + b.share, 0);
    bars.push({ label: `${from}–${to}`, value: share * 100 });
  }
  const rest = summary.speedDistribution
    .filter((b) => b.from * 3.6 >= 40 - 1e-9)
    .reduce((s, b) => s + b.share, 0);
  bars.push({ label: "40+", value: rest * 100 });
  return bars;
}

export function DutyCycleSummary({ summary }: { summary: TDutyCycleSummary }) {
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        <Figure
          label="Operating hours"
          value={
            summary.operatingHours === null
              ? "1 h (typical)"
              : `${summary.operatingHours.toFixed(summary.operatingHours < 10 ? 2 : 1)} h`
          }
        />
        <Figure
          label="Distance per hour"
          value={`${(summary.distancePerHour / 1000).toFixed(2)} km`}
        />
        <Figure label="Time turning" value={`${(summary.turningShare * 100).toFixed(1)} %`} />
        <Figure label="Turns per hour" value={formatPerHour(summary.turnsPerHour)} />
      </dl>
      {summary.operatingHours !== null ? (
        <p className="text-sm text-ink-700">
          Total distance {((summary.distancePerHour * summary.operatingHours) / 1000).toFixed(1)}{" "}
          km. Rows used {summary.rowsUsed.toLocaleString("en-GB")}, skipped{" "}
          {summary.rowsSkipped.toLocaleString("en-GB")}.
        </p>
      ) : null}
      <div className="grid gap-6 lg:grid-cols-3">
        <SummaryBarChart
          title="Turns per hour by radius"
          valueLabel="turns/h"
          bars={summary.byRadiusBand.map((b) => ({ label: b.label, value: b.perHour }))}
        />
        <SummaryBarChart
          title="Turns per hour by surface"
          valueLabel="turns/h"
          bars={summary.bySurface.map((b) => ({
            label: SURFACE_LABELS[b.surface] ?? b.surface,
            value: b.perHour,
          }))}
        />
        <SummaryBarChart
          title="Share of moving time by speed (km/h)"
          valueLabel="%"
          bars={speedBars(summary)}
          format={(v) => v.toFixed(1)}
        />
      </div>
    </div>
  );
}
