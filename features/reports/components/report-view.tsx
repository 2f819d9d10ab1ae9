"use client";

import Link from "next/link";
import { useState } from "react";
import { Card } from "@/lib/ui/card";
import { Caution } from "@/lib/ui/caution";
import {
  formatDepth,
  formatDistance,
  formatHours,
  formatLength,
  formatMass,
  formatReportMoney,
  formatReportRate,
  formatSpeed,
  LAYOUT_NAMES,
  POSITION_NAMES,
  type TReportOption,
} from "@/lib/reports";
import { useReportVersion } from "@/features/reports/api/reports";
import { OptionBars } from "@/features/reports/components/option-bars";

type TSystem = "metric" | "imperial";

const dateOf = (iso: string) =>
  new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

/**
 * An issued report as the customer and the dealer read it: the frozen content, one option at a
 * time (read-only switching between the options the dealer prepared), downloads, cautions.
 */
export function ReportView({
  reportId,
  version,
  system,
}: {
  reportId: string;
  version: number | "latest";
  system: TSystem;
}) {
  const query = useReportVersion(reportId, version);
  const [picked, setPicked] = useState<string | null>(null);
  if (query.isPending) return <p className="text-ink-600">Loading report…</p>;
  if (query.isError)
    return (
      <p role="alert" className="text-danger-700">
        This report could not be loaded: {query.error.message}
      </p>
    );
  const v = query.data;
  const c = v.content;
  const money = (x: number | null) => formatReportMoney(x, c.currency);
  const rate = (x: number | null) => formatReportRate(x, c.currency);
  const option: TReportOption =
    c.options.find((o) => o.key === (picked ?? c.recommendedKey)) ?? c.options[0]!;
  const base = `/api/v1/reports/${reportId}/versions/${v.version}`;
  const dc = c.dutyCycle;

  return (
    <article className="flex flex-col gap-5" aria-label={`Report ${c.title}, version ${v.version}`}>
      {v.supersededAt ? (
        <Caution
          tone="info"
          title={`Version ${v.version} was superseded on ${dateOf(v.supersededAt)}.`}
        >
          <Link href={`/reports/${reportId}`} className="font-medium underline">
            Read the current version ({v.latestVersion})
          </Link>
        </Caution>
      ) : null}
      <header className="flex flex-wrap items-start justify-between gap-4 rounded-lg border border-ink-200 bg-white p-4">
        <div>
          <p className="text-sm font-medium text-ink-700">{c.dealership.name}</p>
          {c.dealership.contactLine ? (
            <p className="text-xs text-ink-600">{c.dealership.contactLine}</p>
          ) : null}
          <h2 className="mt-2 text-xl font-bold text-ink-900">{c.title}</h2>
          <p className="text-sm text-ink-700">
            For {c.customer.name} · version {v.version} · issued {dateOf(c.issuedAt)} by{" "}
            {c.issuedBy} · report {reportId.slice(0, 8).toUpperCase()}
          </p>
        </div>
        <div className="flex flex-col items-end gap-2">
          {v.logo ? (
            // A data: URL of the frozen, re-encoded logo; next/image adds nothing here.
            // eslint-disable-next-line @next/next/no-img-element
            <img src={v.logo} alt={`${c.dealership.name} logo`} className="max-h-16 max-w-48" />
          ) : null}
          <div className="flex flex-wrap gap-2">
            <a
              href={`${base}/pdf`}
              download
              className="inline-flex h-9 items-center rounded-md bg-furrow-600 px-3 text-sm font-medium text-white hover:bg-furrow-700"
            >
              Download PDF
            </a>
            <a
              href={`${base}/csv`}
              download
              className="inline-flex h-9 items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-800 hover:bg-ink-100"
            >
              Turns annex (CSV)
            </a>
          </div>
        </div>
      </header>

      {c.customerNote ? (
        <p className="rounded-md bg-white p-4 text-ink-800">{c.customerNote}</p>
      ) : null}

      <Card title={`Tyre cost per operating hour (${c.currency}/h)`}>
        <OptionBars
          bars={c.options.map((o) => ({
            key: o.key,
            label: o.label,
            value: o.costPerHour,
            highlight: o.key === c.recommendedKey,
          }))}
          format={(x) => rate(x)}
        />
      </Card>

      {c.options.length > 1 ? (
        <div
          role="tablist"
          aria-label="Options the dealer prepared"
          className="flex flex-wrap gap-2"
        >
          {c.options.map((o) => (
            <button
              key={o.key}
              role="tab"
              type="button"
              aria-selected={o.key === option.key}
              onClick={() => setPicked(o.key)}
              className={
                o.key === option.key
                  ? "rounded-md bg-furrow-700 px-3 py-2 text-sm font-medium text-white"
                  : "rounded-md border border-ink-300 bg-white px-3 py-2 text-sm text-ink-800 hover:bg-ink-100"
              }
            >
              {o.label}
            </button>
          ))}
        </div>
      ) : null}

      <Card title={option.label}>
        {option.description ? (
          <p className="mb-2 text-sm text-ink-700">{option.description}</p>
        ) : null}
        <p className="text-sm text-ink-800">
          {option.machine.name} · {LAYOUT_NAMES[option.machine.layout] ?? option.machine.layout} ·
          wheelbase {formatLength(system, option.machine.wheelbase)} · track{" "}
          {formatLength(system, option.machine.tracks.front)} front,{" "}
          {formatLength(system, option.machine.tracks.rear)} rear
        </p>
        <dl className="my-3 grid gap-3 sm:grid-cols-3">
          <div className="rounded-md bg-ink-50 p-3">
            <dt className="text-xs text-ink-600">Tyre cost per operating hour</dt>
            <dd className="text-xl font-bold" data-testid="option-cost">
              {rate(option.costPerHour)}
            </dd>
          </div>
          <div className="rounded-md bg-ink-50 p-3">
            <dt className="text-xs text-ink-600">One-off cost of the change</dt>
            <dd className="text-xl font-bold">
              {option.baseline ? "None (as fitted)" : money(option.oneOffCost)}
            </dd>
          </div>
          <div className="rounded-md bg-ink-50 p-3">
            <dt className="text-xs text-ink-600">Payback</dt>
            <dd className="text-xl font-bold" data-testid="option-payback">
              {option.baseline
                ? "Baseline"
                : option.feasible === false
                  ? "Not workable"
                  : option.paybackHours === null
                    ? "Does not pay back"
                    : formatHours(option.paybackHours)}
            </dd>
          </div>
        </dl>
        {option.feasible === false ? (
          <div className="mb-3">
            <Caution
              tone="danger"
              title="Not workable as priced: it overloads a tyre or adds a turn the machine cannot make at this duty cycle."
            />
          </div>
        ) : null}
        {option.reasons?.length ? (
          <ul className="mb-3 list-disc pl-5 text-sm text-ink-800" aria-label="Why it differs">
            {option.reasons.map((r, i) => (
              <li key={i}>{r}</li>
            ))}
          </ul>
        ) : null}
        <div className="overflow-x-auto">
          <table className="min-w-full divide-y divide-ink-200 text-sm">
            <caption className="sr-only">Tyre life and cost by position</caption>
            <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Position
                </th>
                <th scope="col" className="px-3 py-2">
                  Tyre
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Wear per 100 h
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Tyre life
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Replacement
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  Cost per hour
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {option.positions.map((p) => (
                <tr key={p.position} className={p.wearsFirst ? "bg-caution-50" : undefined}>
                  <th scope="row" className="px-3 py-2 text-left font-medium">
                    {POSITION_NAMES[p.position] ?? p.position}
                    {p.wearsFirst ? (
                      <span className="ml-2 text-xs text-caution-800">wears first</span>
                    ) : null}
                  </th>
                  <td className="px-3 py-2">{p.designation}</td>
                  <td className="px-3 py-2 text-right">
                    {formatDepth(system, p.wearPer100h.total)}
                  </td>
                  <td className="px-3 py-2 text-right">{formatHours(p.hoursToReplacement)}</td>
                  <td className="px-3 py-2 text-right">{money(p.replacementCost)}</td>
                  <td className="px-3 py-2 text-right">{rate(p.costPerHour)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="mt-2 text-xs text-ink-600">
          Fitment:{" "}
          {option.machine.fitment
            .map((f) => `${f.axle} ${f.designation}, axle load ${formatMass(system, f.load)}`)
            .join("; ")}
          .
        </p>
        {option.warnings.map((w, i) => (
          <div key={i} className="mt-2">
            <Caution title={w} />
          </div>
        ))}
        {option.cautions?.map((x) => (
          <div key={x.code} className="mt-2">
            <Caution title="Before making this change">{x.text}</Caution>
          </div>
        ))}
      </Card>

      <Card title={`Duty cycle: ${dc.name}`}>
        <p className="text-sm text-ink-800">
          {dc.turnKinds} kinds of turn, {dc.turnsPerHour.toFixed(1)} turns per operating hour;{" "}
          {formatDistance(system, dc.straightDistancePerHour)} of straight travel per hour at{" "}
          {formatSpeed(system, dc.straightSpeed)}.
        </p>
      </Card>

      {c.recommendations ? (
        <Card title="Recommendations">
          <p className="whitespace-pre-line text-ink-800">{c.recommendations}</p>
        </Card>
      ) : null}

      <Card title="Assumptions and their sources">
        <ul className="flex flex-col gap-2 text-sm">
          {c.assumptions.map((a, i) => (
            <li key={i}>
              <span className="font-medium">{a.topic}:</span> {a.text}{" "}
              <span className="text-ink-600">Source: {a.source}</span>
            </li>
          ))}
        </ul>
        <p className="mt-2 text-xs text-ink-600">Engine version {c.engineVersion}.</p>
      </Card>

      <section aria-label="Safety cautions" className="flex flex-col gap-2">
        {c.cautions.map((x) => (
          <Caution key={x.code} title={x.text} />
        ))}
      </section>
    </article>
  );
}
