"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import type { TOptionOutcome } from "@/lib/scrub";
import { fromSi, unitLabel, type TUnitSystem } from "@/lib/format/units";
import {
  currencySymbol,
  formatDate,
  formatMoney,
  formatNumber,
  POSITION_LABELS,
} from "@/lib/format/format";
import { BarChart } from "@/lib/ui/bar-chart";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution, EstimateSafetyCaution } from "@/lib/ui/caution";
import { toast } from "@/lib/ui/toast";
import {
  useComparison,
  usePrepareQuoteReport,
  useRerunStudy,
} from "@/features/options/api/studies";
import type { TComparisonDto } from "@/features/options/schemas/study";
import { describeChange } from "@/features/options/lib/setup-choices";
import { GroupedBarChart, PaybackChart } from "@/features/options/components/option-charts";
import { StudyVersions } from "@/features/options/components/study-versions";

/** Hours in words; a payback beyond any tyre's working life reads as such, not as 5,253,139 h. */
const hoursText = (h: number | null) =>
  h === null ? "never" : h > 100_000 ? "over 100,000 h" : `${formatNumber(h, 0)} h`;

/** A stored comparison: options beside today's setup, per position, charts, reasons, cautions. */
export function ComparisonView({
  id,
  system,
  currency,
  canRun,
  canShare,
}: {
  id: string;
  system: TUnitSystem;
  /** The dealership's ISO 4217 currency. */
  currency: string;
  canRun: boolean;
  canShare: boolean;
}) {
  const comparison = useComparison(id);
  if (comparison.isPending) return <p className="text-ink-600">Loading comparison…</p>;
  if (comparison.isError)
    return (
      <p role="alert" className="text-danger-700">
        This comparison could not be loaded: {comparison.error.message}
      </p>
    );
  return (
    <ComparisonBody
      c={comparison.data}
      system={system}
      currency={currency}
      canRun={canRun}
      canShare={canShare}
    />
  );
}

function ComparisonBody({
  c,
  system,
  currency,
  canRun,
  canShare,
}: {
  c: TComparisonDto;
  system: TUnitSystem;
  currency: string;
  canRun: boolean;
  canShare: boolean;
}) {
  const router = useRouter();
  const rerun = useRerunStudy<TComparisonDto>("comparison");
  const report = usePrepareQuoteReport();
  const [reportError, setReportError] = useState<string | null>(null);
  const r = c.result;
  const all: TOptionOutcome[] = [r.current, ...r.options];
  const money = (v: number | null) => formatMoney(v, currency);
  const wearUnit = unitLabel(system, "length-mm");
  const wear = (mm: number) => fromSi(system, "length-mm", mm);
  const wearDigits = system === "metric" ? 2 : 3;
  const positions = r.current.positions.map((p) => p.position);
  const feasible = r.options.filter((o) => o.feasible);
  const cheapest = feasible.reduce<TOptionOutcome | null>(
    (best, o) => (best === null || o.costPerHour < best.costPerHour ? o : best),
    null,
  );

  const onRerun = async () => {
    try {
      const next = await rerun.mutateAsync(c.id);
      toast.success(`Version ${next.version} stored`);
      router.push(`/comparisons/${next.id}`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "The comparison could not be rerun.");
    }
  };
  const onReport = async () => {
    setReportError(null);
    try {
      const created = await report.mutateAsync(c.id);
      router.push(`/reports/${created.id}`);
    } catch (e) {
      const message = e instanceof Error ? e.message : "The report could not be prepared.";
      setReportError(message);
      toast.error(message);
    }
  };

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{c.title}</h1>
          <p className="text-ink-700">
            <Link href={`/machines/${c.machineId}`} className="text-furrow-700 hover:underline">
              {c.machineName}
            </Link>
            {c.estimateId ? (
              <>
                {" "}
                ·{" "}
                <Link
                  href={`/estimates/${c.estimateId}`}
                  className="text-furrow-700 hover:underline"
                >
                  the estimate it starts from
                </Link>
              </>
            ) : null}{" "}
            · version {c.version} · totalled over {formatNumber(c.hours, 0)} h · run{" "}
            {formatDate(c.createdAt)} · engine {c.engineVersion}
          </p>
          <StudyVersions kind="comparison" seriesId={c.seriesId} currentId={c.id} />
        </div>
        <div className="flex flex-wrap gap-2">
          {canRun && c.estimateId ? (
            <Link
              href={`/estimates/${c.estimateId}/sweep`}
              className="inline-flex h-9 items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-800 hover:bg-ink-100"
            >
              Sweep a setting
            </Link>
          ) : null}
          {canRun ? (
            <Button variant="secondary" size="sm" busy={rerun.isPending} onClick={onRerun}>
              Rerun as a new version
            </Button>
          ) : null}
          {canShare ? (
            <Button size="sm" busy={report.isPending} onClick={onReport}>
              Prepare a quote report
            </Button>
          ) : null}
        </div>
      </header>
      {reportError ? (
        <p role="alert" className="text-danger-700" data-testid="report-error">
          {reportError}
        </p>
      ) : null}

      <details
        className="rounded-md border-l-4 border-caution-300 bg-caution-50 px-4 py-2 text-sm text-caution-800"
        data-testid="standing-cautions"
      >
        <summary className="cursor-pointer">
          <span className="font-medium">
            Figures are estimates: loads, pressures and speeds come from the makers&apos; data.
          </span>{" "}
          <span className="underline">Read all {r.cautions.length + 1} cautions</span>
        </summary>
        <div className="mt-2 flex flex-col gap-2">
          <EstimateSafetyCaution />
          {r.cautions.map((x) => (
            <Caution key={x.code} title={x.text} />
          ))}
        </div>
      </details>

      <p className="text-lg text-ink-900" data-testid="comparison-verdict">
        {cheapest && cheapest.costPerHour < r.current.costPerHour
          ? `${cheapest.name} costs least: ${money(cheapest.costPerHour)} per hour against ${money(r.current.costPerHour)} today${cheapest.paybackHours !== null ? `, paying back its ${money(cheapest.oneOffCost)} after ${hoursText(cheapest.paybackHours)}` : ""}.`
          : `No usable option costs less per hour than today's setup (${money(r.current.costPerHour)} per hour).`}
      </p>

      <div className="grid gap-4 lg:grid-cols-2 2xl:grid-cols-3" data-testid="option-cards">
        {all.map((o, i) => (
          <OptionCard key={`${i}-${o.name}`} o={o} today={i === 0} system={system} money={money} />
        ))}
      </div>

      <Card title="By wheel position">
        <div className="grid gap-6 lg:grid-cols-2">
          {positions.map((pos, pi) => (
            <div key={pos} className="overflow-x-auto">
              <table
                className="min-w-full divide-y divide-ink-200 text-sm"
                data-testid={`position-table-${pos}`}
              >
                <caption className="py-1 text-left font-medium text-ink-900">
                  {POSITION_LABELS[pos] ?? pos}
                </caption>
                <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
                  <tr>
                    <th scope="col" className="px-3 py-2">
                      Setup
                    </th>
                    <th scope="col" className="px-3 py-2">
                      Tyre
                    </th>
                    <th scope="col" className="whitespace-nowrap px-3 py-2 text-right">
                      Wear ({wearUnit}/100 h)
                    </th>
                    <th scope="col" className="whitespace-nowrap px-3 py-2 text-right">
                      Load
                    </th>
                    <th scope="col" className="whitespace-nowrap px-3 py-2 text-right">
                      Life
                    </th>
                    <th scope="col" className="whitespace-nowrap px-3 py-2 text-right">
                      Per hour ({currency})
                    </th>
                  </tr>
                </thead>
                <tbody className="divide-y divide-ink-100">
                  {all.map((o, i) => {
                    const p = o.positions[pi];
                    if (!p) return null;
                    return (
                      <tr key={`${i}-${o.name}`} className={i === 0 ? "bg-ink-50" : undefined}>
                        <th scope="row" className="px-3 py-2 text-left font-medium">
                          {o.name}
                        </th>
                        <td className="px-3 py-2">{p.designation}</td>
                        <td className="whitespace-nowrap px-3 py-2 text-right">
                          {wear(p.wearPer100h.total).toFixed(wearDigits)}
                        </td>
                        <td
                          className={
                            p.loadRatio > 1
                              ? "whitespace-nowrap px-3 py-2 text-right font-medium text-danger-700"
                              : "whitespace-nowrap px-3 py-2 text-right"
                          }
                        >
                          {Math.round(p.loadRatio * 100)} % of rated
                        </td>
                        <td className="whitespace-nowrap px-3 py-2 text-right">
                          {hoursText(p.hoursToReplacement)}
                        </td>
                        <td className="whitespace-nowrap px-3 py-2 text-right">
                          {money(p.costPerHour)}
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          ))}
        </div>
      </Card>

      <div className="grid gap-6 xl:grid-cols-3">
        <Card title="Cost per hour">
          <BarChart
            title={`Tyre cost per operating hour (${currency})`}
            data={all.map((o) => ({ label: o.name, cost: o.costPerHour }))}
            stacks={[{ key: "cost", label: "Cost per hour", className: "fill-furrow-600" }]}
            value={(d) => (Number.isFinite(d.cost) ? d.cost : 0)}
            yLabel={`${currencySymbol(currency)} per hour`}
            format={(v) => money(v)}
          />
        </Card>
        <Card title="Wear by position">
          <GroupedBarChart
            title="Tread wear per 100 operating hours by wheel position"
            groups={positions.map((p) => POSITION_LABELS[p] ?? p)}
            series={all.map((o) => ({ label: o.name }))}
            value={(g, s) => wear(all[s]?.positions[g]?.wearPer100h.total ?? 0)}
            yLabel={`Wear (${wearUnit}/100 h)`}
            format={(v) => v.toFixed(wearDigits)}
          />
        </Card>
        <Card title="Cost of the change against savings">
          <PaybackChart
            title={`Cost to date over ${formatNumber(c.hours, 0)} operating hours`}
            hours={c.hours}
            current={{ label: r.current.name, costPerHour: r.current.costPerHour }}
            options={r.options.map((o) => ({
              label: o.name,
              oneOffCost: o.oneOffCost,
              costPerHour: o.costPerHour,
              paybackHours: o.paybackHours,
            }))}
            formatMoney={money}
            currencyLabel={currencySymbol(currency)}
          />
        </Card>
      </div>
    </div>
  );
}

function OptionCard({
  o,
  today,
  system,
  money,
}: {
  o: TOptionOutcome;
  today: boolean;
  system: TUnitSystem;
  money: (v: number | null) => string;
}) {
  const blocking = o.warnings.filter((w) => w.severity === "error");
  return (
    <section
      aria-label={o.name}
      className="flex flex-col gap-3 rounded-lg border border-ink-200 bg-white p-4 shadow-sm"
      data-testid="option-card"
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-lg font-medium text-ink-900">{o.name}</h2>
        {today ? (
          <span className="text-sm text-ink-600">today&apos;s setup</span>
        ) : o.feasible ? null : (
          <span className="rounded bg-danger-50 px-2 py-0.5 text-sm font-medium text-danger-700">
            Not usable as entered
          </span>
        )}
      </header>
      {o.changes.length > 0 ? (
        <ul className="list-disc pl-5 text-sm text-ink-800">
          {o.changes.map((ch, i) => (
            <li key={i}>{describeChange(ch, system)}</li>
          ))}
        </ul>
      ) : null}
      <dl className="grid grid-cols-2 gap-2 text-sm">
        <div>
          <dt className="text-ink-600">Cost per hour</dt>
          <dd className="text-xl font-bold text-ink-900">{money(o.costPerHour)}</dd>
        </div>
        {today ? null : (
          <>
            <div>
              <dt className="text-ink-600">Saving per hour</dt>
              <dd
                className={
                  o.savingPerHour > 0
                    ? "text-xl font-bold text-ok-700"
                    : "text-xl font-bold text-danger-700"
                }
              >
                {money(o.savingPerHour)}
              </dd>
            </div>
            <div>
              <dt className="text-ink-600">One-off cost</dt>
              <dd className="font-medium">{money(o.oneOffCost)}</dd>
            </div>
            <div>
              <dt className="text-ink-600">Pays back after</dt>
              <dd className="font-medium" data-testid="payback">
                {hoursText(o.paybackHours)}
              </dd>
            </div>
          </>
        )}
        <div>
          <dt className="text-ink-600">Total incl. change</dt>
          <dd className="font-medium">{money(o.costOverHours)}</dd>
        </div>
        <div>
          <dt className="text-ink-600">First replacement</dt>
          <dd className="font-medium">{hoursText(o.firstReplacementHours)}</dd>
        </div>
      </dl>
      {o.reasons.length > 0 ? (
        <div className="text-sm">
          <h3 className="font-medium text-ink-900">Why</h3>
          <ul className="list-disc pl-5 text-ink-800" data-testid="reasons">
            {o.reasons.map((x, i) => (
              <li key={i}>{x}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {blocking.map((w, i) => (
        <Caution key={`w${i}`} tone="danger" title={w.message} />
      ))}
      {o.cautions.map((x) => (
        <div key={x.code} data-testid="option-caution">
          <Caution title={x.text} />
        </div>
      ))}
    </section>
  );
}
