"use client";

import Link from "next/link";
import { Card } from "@/lib/ui/card";
import { Caution, EstimateSafetyCaution } from "@/lib/ui/caution";
import { useDeleteEstimate, useEstimate } from "@/features/estimates/api/estimates";
import { radiusBands } from "@/features/estimates/lib/radius-bands";
import type { TCaution } from "@/lib/scrub";
import { fromSi, unitLabel, type TUnitSystem } from "@/lib/format/units";
import { BarChart } from "@/lib/ui/bar-chart";
import { TurnKindsTable } from "@/features/estimates/components/turn-kinds-table";
import { DeleteButton } from "@/lib/ui/delete-button";
import { formatDate, formatMoney, formatNumber, POSITION_LABELS } from "@/lib/format/format";

/** One short line with the standing caution; all general cautions one click away. */
function CautionSummary({ cautions }: { cautions: TCaution[] }) {
  return (
    <details
      className="rounded-md border-l-4 border-caution-300 bg-caution-50 px-4 py-2 text-sm text-caution-800"
      data-testid="caution-summary"
    >
      <summary className="cursor-pointer">
        <span className="font-medium">
          Figures are estimates: loads, pressures and speeds come from the makers&apos; data.
        </span>{" "}
        <span className="underline">Read all {cautions.length + 1} cautions</span>
      </summary>
      <div className="mt-2 flex flex-col gap-2">
        <EstimateSafetyCaution />
        {cautions.map((c) => (
          <Caution key={c.code} title={c.text} />
        ))}
      </div>
    </details>
  );
}

/** A stored estimate: per-position wear and cost, charts, the engine's warnings and the cautions. */
export function EstimateResult({
  id,
  system,
  currency,
  canWrite,
}: {
  id: string;
  system: TUnitSystem;
  /** The dealership's ISO 4217 currency. */
  currency: string;
  canWrite: boolean;
}) {
  const estimate = useEstimate(id);
  const remove = useDeleteEstimate();
  if (estimate.isPending) return <p className="text-ink-600">Loading estimate…</p>;
  if (estimate.isError)
    return (
      <p role="alert" className="text-danger-700">
        This estimate could not be loaded: {estimate.error.message}
      </p>
    );
  const e = estimate.data;
  const r = e.result;
  const bands = radiusBands(r);
  // Cautions about one thing sit beside it; the rest fold into the one line at the top.
  // A skid steer's wheels are all driven in fixed ratio: "front-axle lead" means nothing there.
  const showLead = r.lead !== null && !r.turns.every((t) => t.steeringMode === "skid");
  const stability = r.cautions.find((c) => c.code === "stability");
  const leadCaution = showLead ? r.cautions.find((c) => c.code === "lead-matching") : undefined;
  const general = r.cautions.filter((c) => c !== stability && c !== leadCaution);
  const wearUnit = unitLabel(system, "length-mm");
  const wear = (mm: number) => fromSi(system, "length-mm", mm);
  const wearDigits = system === "metric" ? 2 : 3;
  const positions = r.positions.map((p) => ({
    ...p,
    label: POSITION_LABELS[p.position] ?? p.position,
  }));

  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{e.title}</h1>
          <p className="text-ink-700">
            <Link href={`/machines/${e.machineId}`} className="text-furrow-700 hover:underline">
              {e.machineName}
            </Link>{" "}
            (version {e.machineVersion}) · {e.dutyCycleName} · {e.customerName ?? "no customer"} ·
            run {formatDate(e.createdAt)} · engine {e.engineVersion}
          </p>
          {stability ? (
            <p
              role="note"
              className="mt-1 text-sm text-caution-800"
              data-testid="stability-caution"
            >
              {stability.text}
            </p>
          ) : null}
        </div>
        <div className="flex flex-wrap gap-2">
          {canWrite ? (
            <Link
              href={`/estimates/${e.id}/try-setup`}
              className="inline-flex h-9 items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-800 hover:bg-ink-100"
            >
              Try another setup
            </Link>
          ) : null}
          <a
            href={`/api/v1/estimates/${e.id}/csv`}
            download
            className="inline-flex h-9 items-center rounded-md bg-furrow-600 px-3 text-sm font-medium text-white hover:bg-furrow-700"
          >
            Download turns (CSV)
          </a>
          {canWrite ? (
            <DeleteButton
              what="this estimate"
              consequences="The stored result is removed. The machine and duty cycle stay."
              onDelete={() => remove.mutateAsync(e.id)}
              redirectTo="/estimates"
            />
          ) : null}
        </div>
      </header>

      <CautionSummary cautions={general} />

      <dl className="grid gap-3 sm:grid-cols-3">
        <div className="rounded-lg border border-ink-200 bg-white p-4">
          <dt className="text-sm text-ink-600">Tyre cost per operating hour</dt>
          <dd className="text-2xl font-bold text-ink-900" data-testid="cost-per-hour">
            {formatMoney(r.costPerHour, currency)}
          </dd>
        </div>
        <div className="rounded-lg border border-ink-200 bg-white p-4">
          <dt className="text-sm text-ink-600">Wears out first</dt>
          <dd className="text-2xl font-bold text-ink-900">
            {r.firstToWear ? POSITION_LABELS[r.firstToWear] : "No wear predicted"}
          </dd>
          <dd className="text-sm text-ink-700">
            {e.hoursToFirstReplacement !== null
              ? `after about ${formatNumber(e.hoursToFirstReplacement, 0)} h`
              : ""}
          </dd>
        </div>
        {showLead && r.lead !== null ? (
          <div className="rounded-lg border border-ink-200 bg-white p-4" data-testid="lead-card">
            <dt className="text-sm text-ink-600">Front axle lead in straight travel</dt>
            <dd className="text-2xl font-bold text-ink-900">{(r.lead * 100).toFixed(1)} %</dd>
            {leadCaution ? (
              <dd role="note" className="mt-1 text-xs text-caution-800">
                {leadCaution.text}
              </dd>
            ) : null}
          </div>
        ) : null}
      </dl>

      {r.warnings.length > 0 ? (
        <section aria-label="Warnings from the engine" className="flex flex-col gap-2">
          <h2 className="text-lg font-medium text-ink-900">Warnings</h2>
          {r.warnings.map((w, i) => (
            <Caution
              key={i}
              tone={w.severity === "error" ? "danger" : w.severity === "info" ? "info" : "caution"}
              title={w.message}
            >
              {w.position ? `Position: ${POSITION_LABELS[w.position]}. ` : ""}
              {w.turnIndex !== undefined ? `Turn ${w.turnIndex + 1}.` : ""}
            </Caution>
          ))}
        </section>
      ) : null}

      <Card title="Wear and cost by wheel position">
        <div className="overflow-x-auto">
          <table
            className="min-w-full divide-y divide-ink-200 text-sm"
            data-testid="positions-table"
          >
            <caption className="sr-only">Wear and cost by wheel position</caption>
            <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Position
                </th>
                <th scope="col" className="px-3 py-2">
                  Tyre
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Base wear ({wearUnit}/100 h)
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Scrub wear ({wearUnit}/100 h)
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Total ({wearUnit}/100 h)
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Hours to replacement
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Cost per hour ({currency})
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {positions.map((p) => (
                <tr key={p.position} className={p.wearsFirst ? "bg-caution-50" : undefined}>
                  <th scope="row" className="px-3 py-2 text-left font-medium">
                    {p.label}
                    {p.wearsFirst ? (
                      <span className="ml-2 text-xs text-caution-800">wears first</span>
                    ) : null}
                  </th>
                  <td className="px-3 py-2">{p.designation}</td>
                  <td className="px-3 py-2 text-right">
                    {wear(p.wearPer100h.base).toFixed(wearDigits)}
                  </td>
                  <td className="px-3 py-2 text-right">
                    {wear(p.wearPer100h.scrub).toFixed(wearDigits)}
                  </td>
                  <td className="px-3 py-2 text-right">
                    {wear(p.wearPer100h.total).toFixed(wearDigits)}
                  </td>
                  <td className="px-3 py-2 text-right">{formatNumber(p.hoursToReplacement, 0)}</td>
                  <td className="px-3 py-2 text-right">{formatMoney(p.costPerHour, currency)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {r.rotation.length > 0 ? (
          <div className="mt-4 flex flex-col gap-1 text-sm">
            <h3 className="font-medium text-ink-900">Rotation advice</h3>
            {r.rotation.map((a, i) => (
              <p key={i}>
                Swap {POSITION_LABELS[a.swap[0]]} and {POSITION_LABELS[a.swap[1]]} at about{" "}
                {formatNumber(a.atHours, 0)} h: pair life {formatNumber(a.lifeWithout, 0)} h →{" "}
                {formatNumber(a.lifeWith, 0)} h. {a.note}
              </p>
            ))}
          </div>
        ) : null}
      </Card>

      <div className="grid gap-6 lg:grid-cols-3">
        <Card title="Slip angle by turn radius">
          <BarChart
            title="Mean slip angle by turn radius band"
            data={bands}
            stacks={[{ key: "slip", label: "Mean slip angle", className: "fill-furrow-600" }]}
            value={(b) => b.meanSlipAngle}
            yLabel="Slip angle (°)"
          />
        </Card>
        <Card title="Scrub by turn radius">
          <BarChart
            title="Scrub distance per operating hour by turn radius band"
            data={bands.map((b) => ({ ...b, scrub: fromSi(system, "distance-m", b.scrubPerHour) }))}
            stacks={[{ key: "scrub", label: "Scrub per hour", className: "fill-plum-600" }]}
            value={(b) => b.scrub}
            yLabel={`Scrub (${unitLabel(system, "distance-m")}/h)`}
            format={(v) => v.toFixed(1)}
          />
        </Card>
        <Card title="Wear split">
          <BarChart
            title="Tread wear per 100 operating hours, base and scrub"
            data={positions}
            stacks={[
              { key: "base", label: "Base rolling wear", className: "fill-ink-300" },
              { key: "scrub", label: "Scrub wear", className: "fill-plum-600" },
            ]}
            value={(p, key) => wear(key === "base" ? p.wearPer100h.base : p.wearPer100h.scrub)}
            yLabel={`Wear (${wearUnit}/100 h)`}
            format={(v) => v.toFixed(wearDigits)}
          />
        </Card>
      </div>

      <Card title="Turns">
        <TurnKindsTable result={r} traits={e.turnTraits} system={system} currency={currency} />
      </Card>
    </div>
  );
}
