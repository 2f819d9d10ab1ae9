"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar, Line, LinePath } from "@visx/shape";
import { ChartDataTable, ChartFigure, ChartLegend } from "@/lib/ui/chart-frame";

const W = 520;
const H = 280;
const M = { top: 14, right: 16, bottom: 48, left: 64 };

/** One colour per series, today's setup first (greys), options after; fill and stroke alike. */
export const SERIES_FILL = [
  "fill-ink-300",
  "fill-furrow-600",
  "fill-plum-600",
  "fill-ok-700",
  "fill-caution-300",
] as const;
export const SERIES_STROKE = [
  "stroke-ink-500",
  "stroke-furrow-600",
  "stroke-plum-600",
  "stroke-ok-700",
  "stroke-caution-300",
] as const;

export type TSeries = { label: string };

/** One legend entry per series, in the series colours. */
const legendOf = (series: TSeries[]) =>
  series.map((s, i) => ({ label: s.label, className: SERIES_FILL[i % SERIES_FILL.length]! }));

/**
 * Bars grouped by category (wheel position), one bar per series (today's setup and each
 * option) inside each group.
 */
export function GroupedBarChart({
  title,
  groups,
  series,
  value,
  yLabel,
  format,
}: {
  title: string;
  groups: string[];
  series: TSeries[];
  /** Value of series `s` in group `g`. */
  value: (g: number, s: number) => number;
  yLabel: string;
  format: (v: number) => string;
}) {
  const all = groups.flatMap((_, g) => series.map((_s, s) => value(g, s)));
  const outer = scaleBand({ domain: groups, range: [M.left, W - M.right], padding: 0.2 });
  const inner = scaleBand({
    domain: series.map((s) => s.label),
    range: [0, outer.bandwidth()],
    padding: 0.08,
  });
  const y = scaleLinear({
    domain: [0, Math.max(1e-9, ...all.filter(Number.isFinite)) * 1.1],
    range: [H - M.bottom, M.top],
    nice: true,
  });
  return (
    <ChartFigure
      title={title}
      width={W}
      height={H}
      maxWidth={520}
      after={
        <>
          <ChartLegend items={legendOf(series)} />
          <ChartDataTable
            title={title}
            columns={series.map((s) => s.label)}
            rows={groups.map((g, gi) => ({
              label: g,
              cells: series.map((_s, si) => format(value(gi, si))),
            }))}
          />
        </>
      }
    >
      <GridRows
        scale={y}
        left={M.left}
        width={W - M.left - M.right}
        className="stroke-ink-100"
        numTicks={5}
      />
      {groups.map((g, gi) => (
        <Group key={g} left={outer(g)}>
          {series.map((s, si) => {
            const v = value(gi, si);
            const top = y(Number.isFinite(v) ? v : 0);
            return (
              <Bar
                key={s.label}
                x={inner(s.label)}
                y={top}
                width={inner.bandwidth()}
                height={Math.max(0, H - M.bottom - top)}
                className={SERIES_FILL[si % SERIES_FILL.length]}
              />
            );
          })}
        </Group>
      ))}
      <AxisBottom
        top={H - M.bottom}
        scale={outer}
        tickLabelProps={{ fontSize: 10, textAnchor: "middle" }}
      />
      <AxisLeft
        left={M.left}
        scale={y}
        numTicks={5}
        label={yLabel}
        tickLabelProps={{ fontSize: 10, textAnchor: "end", dx: -4, dy: 3 }}
        labelProps={{ fontSize: 11, textAnchor: "middle" }}
      />
    </ChartFigure>
  );
}

/**
 * What each option costs in total against hours worked: its one-off cost at hour 0 plus tyre
 * cost per hour, beside today's setup. Where an option's line crosses today's, it has paid back.
 */
export function PaybackChart({
  title,
  hours,
  current,
  options,
  formatMoney,
  currencyLabel,
}: {
  title: string;
  hours: number;
  current: { label: string; costPerHour: number };
  options: {
    label: string;
    oneOffCost: number;
    costPerHour: number;
    paybackHours: number | null;
  }[];
  formatMoney: (v: number) => string;
  currencyLabel: string;
}) {
  const lines = [
    { label: current.label, start: 0, perHour: current.costPerHour, payback: null },
    ...options.map((o) => ({
      label: o.label,
      start: o.oneOffCost,
      perHour: o.costPerHour,
      payback: o.paybackHours,
    })),
  ];
  const total = (l: (typeof lines)[number], h: number) => l.start + l.perHour * h;
  const x = scaleLinear({ domain: [0, hours], range: [M.left, W - M.right] });
  const y = scaleLinear({
    domain: [
      0,
      Math.max(1e-9, ...lines.map((l) => total(l, hours)).filter(Number.isFinite)) * 1.05,
    ],
    range: [H - M.bottom, M.top],
    nice: true,
  });
  return (
    <ChartFigure
      title={title}
      width={W}
      height={H}
      maxWidth={520}
      after={
        <>
          <ChartLegend items={legendOf(lines)} />
          <p className="text-xs text-ink-600">
            Dashed grey: today&apos;s setup. A dot marks where an option has paid for its change.
          </p>
          <ChartDataTable
            title={title}
            columns={["Cost at 0 h", `Cost at ${hours} h`, "Pays back after"]}
            rows={lines.map((l) => ({
              label: l.label,
              cells: [
                formatMoney(l.start),
                formatMoney(total(l, hours)),
                l.payback === null ? "—" : `${Math.round(l.payback)} h`,
              ],
            }))}
          />
        </>
      }
    >
      <GridRows
        scale={y}
        left={M.left}
        width={W - M.left - M.right}
        className="stroke-ink-100"
        numTicks={5}
      />
      {lines.map((l, i) =>
        Number.isFinite(l.perHour) ? (
          <LinePath
            key={l.label}
            data={[0, hours]}
            x={(h) => x(h)}
            y={(h) => y(total(l, h))}
            strokeWidth={i === 0 ? 2.5 : 2}
            strokeDasharray={i === 0 ? "6 4" : undefined}
            className={SERIES_STROKE[i % SERIES_STROKE.length]}
          />
        ) : null,
      )}
      {lines.map((l, i) =>
        l.payback !== null && l.payback > 0 && l.payback <= hours ? (
          <g key={`pb-${l.label}`}>
            <Line
              from={{ x: x(l.payback), y: y(total(l, l.payback)) }}
              to={{ x: x(l.payback), y: H - M.bottom }}
              strokeDasharray="2 3"
              className={SERIES_STROKE[i % SERIES_STROKE.length]}
            />
            <circle
              cx={x(l.payback)}
              cy={y(total(l, l.payback))}
              r={4}
              className={SERIES_FILL[i % SERIES_FILL.length]}
            />
          </g>
        ) : null,
      )}
      <AxisBottom
        top={H - M.bottom}
        scale={x}
        numTicks={5}
        label="Operating hours (h)"
        tickLabelProps={{ fontSize: 10, textAnchor: "middle" }}
        labelProps={{ fontSize: 11, textAnchor: "middle" }}
      />
      <AxisLeft
        left={M.left}
        scale={y}
        numTicks={5}
        label={`Cost to date (${currencyLabel})`}
        tickLabelProps={{ fontSize: 10, textAnchor: "end", dx: -4, dy: 3 }}
        labelProps={{ fontSize: 11, textAnchor: "middle" }}
      />
    </ChartFigure>
  );
}

/** Cost per hour against one setting, today's value and the best within limits marked. */
export function SweepChart({
  title,
  points,
  current,
  best,
  xLabel,
  yLabel,
  formatX,
  formatY,
  unit,
}: {
  title: string;
  /** Unit of the swept value, for the legend ("" for pure numbers). */
  unit: string;
  points: { x: number; y: number | null; feasible: boolean }[];
  current: { x: number; y: number };
  best: { x: number; y: number } | null;
  xLabel: string;
  yLabel: string;
  formatX: (v: number) => string;
  formatY: (v: number) => string;
}) {
  const xs = [...points.map((p) => p.x), current.x];
  const ys = [
    ...points.map((p) => p.y).filter((v): v is number => v !== null && Number.isFinite(v)),
    current.y,
  ].filter(Number.isFinite);
  const x = scaleLinear({
    domain: [Math.min(...xs), Math.max(...xs) + (Math.max(...xs) === Math.min(...xs) ? 1 : 0)],
    range: [M.left, W - M.right],
    nice: true,
  });
  // Around the values, not from zero: a sweep is read for where the curve dips.
  const lo = Math.min(...ys);
  const hi = Math.max(...ys);
  const pad = Math.max((hi - lo) * 0.15, Math.abs(hi) * 0.01, 1e-6);
  const y = scaleLinear({
    domain: [Math.max(0, lo - pad), hi + pad],
    range: [H - M.bottom, M.top],
    nice: true,
  });
  const drawn = points.filter((p) => p.y !== null && Number.isFinite(p.y));
  return (
    <ChartFigure
      title={title}
      width={W}
      height={H}
      maxWidth={720}
      after={
        <>
          <div className="flex flex-wrap gap-4 text-xs text-ink-700">
            <span className="flex items-center gap-1">
              <svg width="14" height="12" aria-hidden>
                <line
                  x1="7"
                  x2="7"
                  y1="0"
                  y2="12"
                  strokeDasharray="3 2"
                  className="stroke-ink-500"
                />
              </svg>
              Today: {formatX(current.x)}
              {unit && unit !== "°" ? ` ${unit}` : unit}
            </span>
            {best ? (
              <span className="flex items-center gap-1">
                <svg width="12" height="12" aria-hidden>
                  <circle cx="6" cy="6" r="5" className="fill-ok-700" />
                </svg>
                Best within limits: {formatX(best.x)}
                {unit && unit !== "°" ? ` ${unit}` : unit}
              </span>
            ) : (
              <span>No setting within limits</span>
            )}
            <span className="flex items-center gap-1">
              <svg width="12" height="12" aria-hidden>
                <circle
                  cx="6"
                  cy="6"
                  r="4"
                  strokeWidth="2"
                  className="fill-white stroke-danger-600"
                />
              </svg>
              Not usable (outside limits, overloads a tyre or cannot make a turn)
            </span>
          </div>
          <ChartDataTable
            title={title}
            columns={[yLabel, "Usable"]}
            rows={points.map((p) => ({
              label: formatX(p.x),
              cells: [p.y === null ? "—" : formatY(p.y), p.feasible ? "yes" : "no"],
            }))}
          />
        </>
      }
    >
      <GridRows
        scale={y}
        left={M.left}
        width={W - M.left - M.right}
        className="stroke-ink-100"
        numTicks={5}
      />
      <LinePath
        data={drawn}
        x={(p) => x(p.x)}
        y={(p) => y(p.y ?? 0)}
        strokeWidth={2}
        className="stroke-furrow-600"
      />
      {points.map((p, i) =>
        p.y === null || !Number.isFinite(p.y) ? (
          // The engine could not apply this value: a cross on the axis.
          <g key={i} className="stroke-danger-600" strokeWidth={2}>
            <line x1={x(p.x) - 4} x2={x(p.x) + 4} y1={H - M.bottom - 8} y2={H - M.bottom} />
            <line x1={x(p.x) - 4} x2={x(p.x) + 4} y1={H - M.bottom} y2={H - M.bottom - 8} />
          </g>
        ) : p.feasible ? (
          <circle key={i} cx={x(p.x)} cy={y(p.y)} r={3} className="fill-furrow-600" />
        ) : (
          <circle
            key={i}
            cx={x(p.x)}
            cy={y(p.y)}
            r={4}
            strokeWidth={2}
            className="fill-white stroke-danger-600"
          />
        ),
      )}
      <Line
        from={{ x: x(current.x), y: M.top }}
        to={{ x: x(current.x), y: H - M.bottom }}
        strokeDasharray="6 4"
        strokeWidth={1.5}
        className="stroke-ink-500"
      />
      {best ? (
        <>
          <Line
            from={{ x: x(best.x), y: M.top }}
            to={{ x: x(best.x), y: H - M.bottom }}
            strokeWidth={1.5}
            className="stroke-ok-700"
          />
          <circle cx={x(best.x)} cy={y(best.y)} r={6} className="fill-ok-700" />
        </>
      ) : null}
      <AxisBottom
        top={H - M.bottom}
        scale={x}
        numTicks={6}
        label={xLabel}
        tickFormat={(v) => formatX(Number(v))}
        tickLabelProps={{ fontSize: 10, textAnchor: "middle" }}
        labelProps={{ fontSize: 11, textAnchor: "middle" }}
      />
      <AxisLeft
        left={M.left}
        scale={y}
        numTicks={5}
        label={yLabel}
        tickLabelProps={{ fontSize: 10, textAnchor: "end", dx: -4, dy: 3 }}
        labelProps={{ fontSize: 11, textAnchor: "middle" }}
      />
    </ChartFigure>
  );
}
