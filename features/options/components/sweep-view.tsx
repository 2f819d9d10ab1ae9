"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import type { TUnitSystem } from "@/lib/format/units";
import { currencySymbol, formatDate, formatMoney, formatNumber } from "@/lib/format/format";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution, EstimateSafetyCaution } from "@/lib/ui/caution";
import { toast } from "@/lib/ui/toast";
import { useRerunStudy, useSweep } from "@/features/options/api/studies";
import type { TSweepDto } from "@/features/options/schemas/study";
import {
  PARAMETER_LABELS,
  parameterFromSi,
  parameterUnit,
} from "@/features/options/lib/setup-choices";
import { SweepChart } from "@/features/options/components/option-charts";
import { StudyVersions } from "@/features/options/components/study-versions";

/** A stored sweep: cost per hour against one setting, today's and the best usable value. */
export function SweepView({
  id,
  system,
  currency,
  canRun,
}: {
  id: string;
  system: TUnitSystem;
  currency: string;
  canRun: boolean;
}) {
  const sweep = useSweep(id);
  if (sweep.isPending) return <p className="text-ink-600">Loading sweep…</p>;
  if (sweep.isError)
    return (
      <p role="alert" className="text-danger-700">
        This sweep could not be loaded: {sweep.error.message}
      </p>
    );
  return <SweepBody s={sweep.data} system={system} currency={currency} canRun={canRun} />;
}

function SweepBody({
  s,
  system,
  currency,
  canRun,
}: {
  s: TSweepDto;
  system: TUnitSystem;
  currency: string;
  canRun: boolean;
}) {
  const router = useRouter();
  const rerun = useRerunStudy<TSweepDto>("sweep");
  const r = s.result;
  const label = PARAMETER_LABELS[r.parameter];
  const unit = parameterUnit(system, r.parameter);
  const shown = (v: number) => parameterFromSi(system, r.parameter, v);
  const fmtX = (v: number) => `${formatNumber(v, 3)}${unit === "°" ? "°" : unit ? ` ${unit}` : ""}`;
  const money = (v: number | null) => formatMoney(v, currency);
  const usable = r.points.filter((p) => p.feasible).length;

  const onRerun = async () => {
    try {
      const next = await rerun.mutateAsync(s.id);
      toast.success(`Version ${next.version} stored`);
      router.push(`/sweeps/${next.id}`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "The sweep could not be rerun.");
    }
  };

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{s.title}</h1>
          <p className="text-ink-700">
            <Link href={`/machines/${s.machineId}`} className="text-furrow-700 hover:underline">
              {s.machineName}
            </Link>
            {s.estimateId ? (
              <>
                {" "}
                ·{" "}
                <Link
                  href={`/estimates/${s.estimateId}`}
                  className="text-furrow-700 hover:underline"
                >
                  the estimate it starts from
                </Link>
              </>
            ) : null}{" "}
            · version {s.version} · run {formatDate(s.createdAt)} · engine {s.engineVersion}
          </p>
          <StudyVersions kind="sweep" seriesId={s.seriesId} currentId={s.id} />
        </div>
        {canRun ? (
          <Button variant="secondary" size="sm" busy={rerun.isPending} onClick={onRerun}>
            Rerun as a new version
          </Button>
        ) : null}
      </header>

      {r.cautions.map((c) => (
        <div key={c.code} data-testid="sweep-caution">
          <Caution title={c.text} />
        </div>
      ))}
      <details className="rounded-md border-l-4 border-caution-300 bg-caution-50 px-4 py-2 text-sm text-caution-800">
        <summary className="cursor-pointer font-medium">
          Figures are estimates: loads, pressures and speeds come from the makers&apos; data.
        </summary>
        <div className="mt-2">
          <EstimateSafetyCaution />
        </div>
      </details>

      <dl className="grid gap-3 sm:grid-cols-3">
        <div className="rounded-lg border border-ink-200 bg-white p-4">
          <dt className="text-sm text-ink-600">Today</dt>
          <dd className="text-2xl font-bold text-ink-900">{fmtX(shown(r.current.value))}</dd>
          <dd className="text-sm text-ink-700">{money(r.current.costPerHour)} per hour</dd>
        </div>
        <div className="rounded-lg border border-ink-200 bg-white p-4">
          <dt className="text-sm text-ink-600">Best within limits</dt>
          <dd className="text-2xl font-bold text-ok-700" data-testid="sweep-best">
            {r.best ? fmtX(shown(r.best.value)) : "none"}
          </dd>
          <dd className="text-sm text-ink-700">
            {r.best
              ? // Per 1,000 h: a saving of a fraction of a penny per hour still reads as money.
                `${money(r.best.costPerHour)} per hour; ${money((r.current.costPerHour - r.best.costPerHour) * 1000)} less than today per 1,000 operating hours`
              : "No value in the range is usable."}
          </dd>
        </div>
        <div className="rounded-lg border border-ink-200 bg-white p-4">
          <dt className="text-sm text-ink-600">Usable values</dt>
          <dd className="text-2xl font-bold text-ink-900">
            {usable} of {r.points.length}
          </dd>
        </div>
      </dl>

      <Card title={`Cost per hour against ${label.toLowerCase()}`}>
        <SweepChart
          title={`Tyre cost per operating hour (${currency}) against ${label.toLowerCase()}`}
          points={r.points.map((p) => ({
            x: shown(p.value),
            y: p.costPerHour,
            feasible: p.feasible,
          }))}
          current={{ x: shown(r.current.value), y: r.current.costPerHour }}
          best={r.best ? { x: shown(r.best.value), y: r.best.costPerHour } : null}
          xLabel={`${label}${unit ? ` (${unit})` : ""}`}
          unit={unit}
          yLabel={`${currencySymbol(currency)} per hour`}
          formatX={(v) => formatNumber(v, 2)}
          formatY={(v) => money(v)}
        />
      </Card>

      <Card title="Every value">
        <div className="max-h-96 overflow-auto">
          <table className="min-w-full divide-y divide-ink-200 text-sm" data-testid="sweep-table">
            <caption className="sr-only">Every value of the sweep</caption>
            <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
              <tr>
                <th scope="col" className="px-3 py-2">
                  {label}
                  {unit ? ` (${unit})` : ""}
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Per hour ({currency})
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  First replacement
                </th>
                <th scope="col" className="px-3 py-2">
                  Usable
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {r.points.map((p, i) => {
                // The declared limits say most plainly why a value is out; then the engine's.
                const why =
                  p.warnings.find((w) => w.code === "outside-limits") ??
                  p.warnings.find((w) => w.severity === "error");
                return (
                  <tr key={i} className={p.feasible ? undefined : "bg-danger-50"}>
                    <th scope="row" className="px-3 py-2 text-left font-medium">
                      {formatNumber(shown(p.value), 3)}
                    </th>
                    <td className="px-3 py-2 text-right">{money(p.costPerHour)}</td>
                    <td className="px-3 py-2 text-right">
                      {p.hoursToReplacement === null
                        ? "—"
                        : `${formatNumber(p.hoursToReplacement, 0)} h`}
                    </td>
                    <td className="px-3 py-2">
                      {p.feasible ? "yes" : `no${why ? `: ${why.message}` : ""}`}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </Card>
    </div>
  );
}
