"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridColumns, GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { LinePath } from "@visx/shape";

const W = 420;
const H = 300;
const M = { top: 16, right: 16, bottom: 44, left: 52 };

export type TChartSeries = {
  label: string;
  points: { x: number; y: number }[];
  className: string;
  dashed?: boolean;
};

/** A small line chart with axes and a legend (lock-range and turning-circle curves). */
export function LineChart({
  title,
  xLabel,
  yLabel,
  series,
  markerX,
}: {
  title: string;
  xLabel: string;
  yLabel: string;
  series: TChartSeries[];
  markerX?: number;
}) {
  const all = series.flatMap((s) => s.points).filter((p) => Number.isFinite(p.y));
  const xMax = Math.max(1, ...all.map((p) => p.x));
  const yMax = Math.max(1, ...all.map((p) => p.y));
  const x = scaleLinear({ domain: [0, xMax], range: [M.left, W - M.right], nice: true });
  const y = scaleLinear({ domain: [0, yMax * 1.05], range: [H - M.bottom, M.top], nice: true });
  return (
    <figure className="flex flex-col gap-2">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={title}
        className="w-full max-w-[420px] rounded-md border border-ink-200 bg-white"
      >
        <GridRows
          scale={y}
          left={M.left}
          width={W - M.left - M.right}
          className="stroke-ink-100"
          numTicks={5}
        />
        <GridColumns
          scale={x}
          top={M.top}
          height={H - M.top - M.bottom}
          className="stroke-ink-100"
          numTicks={6}
        />
        <Group>
          {series.map((s) => (
            <LinePath
              key={s.label}
              data={s.points.filter((p) => Number.isFinite(p.y))}
              x={(p) => x(p.x)}
              y={(p) => y(p.y)}
              className={s.className}
              strokeWidth={2.5}
              fill="none"
              strokeDasharray={s.dashed ? "6 4" : undefined}
            />
          ))}
          {markerX !== undefined ? (
            <line
              x1={x(markerX)}
              x2={x(markerX)}
              y1={M.top}
              y2={H - M.bottom}
              className="stroke-plum-600"
              strokeDasharray="2 3"
            />
          ) : null}
        </Group>
        <AxisBottom
          top={H - M.bottom}
          scale={x}
          numTicks={6}
          label={xLabel}
          tickLabelProps={{ fontSize: 11 }}
          labelProps={{ fontSize: 12, textAnchor: "middle" }}
        />
        <AxisLeft
          left={M.left}
          scale={y}
          numTicks={5}
          label={yLabel}
          tickLabelProps={{ fontSize: 11, textAnchor: "end", dx: -4, dy: 3 }}
          labelProps={{ fontSize: 12, textAnchor: "middle" }}
        />
      </svg>
      <figcaption className="flex flex-wrap gap-4 text-xs text-ink-700">
        {series.map((s) => (
          <span key={s.label} className="flex items-center gap-1">
            <svg width="22" height="8" aria-hidden>
              <line
                x1="0"
                y1="4"
                x2="22"
                y2="4"
                className={s.className}
                strokeWidth="2.5"
                strokeDasharray={s.dashed ? "6 4" : undefined}
              />
            </svg>
            {s.label}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
