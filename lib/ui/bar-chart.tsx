"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";

const W = 460;
const H = 260;
const M = { top: 12, right: 12, bottom: 48, left: 56 };

export type TStack = { key: string; label: string; className: string };

/**
 * Vertical bars, stacked when several keys are given; values are listed in a visually hidden
 * table so the figures are readable without the picture.
 */
export function BarChart<T extends { label: string }>({
  title,
  data,
  stacks,
  value,
  yLabel,
  format = (v) => v.toFixed(2),
}: {
  title: string;
  data: T[];
  stacks: TStack[];
  value: (row: T, key: string) => number;
  yLabel: string;
  format?: (v: number) => string;
}) {
  const totals = data.map((d) => stacks.reduce((s, k) => s + value(d, k.key), 0));
  const x = scaleBand({
    domain: data.map((d) => d.label),
    range: [M.left, W - M.right],
    padding: 0.3,
  });
  const y = scaleLinear({
    domain: [0, Math.max(1e-9, ...totals) * 1.1],
    range: [H - M.bottom, M.top],
    nice: true,
  });
  return (
    <figure className="flex flex-col gap-2">
      <figcaption className="text-sm font-medium text-ink-900">{title}</figcaption>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={title} className="w-full max-w-[460px]">
        <GridRows
          scale={y}
          left={M.left}
          width={W - M.left - M.right}
          className="stroke-ink-100"
          numTicks={5}
        />
        <Group>
          {data.map((d) => {
            let base = 0;
            return stacks.map((s) => {
              const v = value(d, s.key);
              const y0 = y(base);
              base += v;
              const y1 = y(base);
              return (
                <Bar
                  key={`${d.label}-${s.key}`}
                  x={x(d.label)}
                  y={y1}
                  width={x.bandwidth()}
                  height={Math.max(0, y0 - y1)}
                  className={s.className}
                />
              );
            });
          })}
        </Group>
        <AxisBottom
          top={H - M.bottom}
          scale={x}
          // Long group names ("50 m and over") wrap onto a second line within their band.
          tickLabelProps={{
            fontSize: 10,
            textAnchor: "middle",
            verticalAnchor: "start",
            width: x.step(),
          }}
        />
        <AxisLeft
          left={M.left}
          scale={y}
          numTicks={5}
          label={yLabel}
          tickLabelProps={{ fontSize: 10, textAnchor: "end", dx: -4, dy: 3 }}
          labelProps={{ fontSize: 11, textAnchor: "middle" }}
        />
      </svg>
      {stacks.length > 1 ? (
        <div className="flex flex-wrap gap-4 text-xs text-ink-700">
          {stacks.map((s) => (
            <span key={s.key} className="flex items-center gap-1">
              <svg width="12" height="12" aria-hidden>
                <rect width="12" height="12" className={s.className} />
              </svg>
              {s.label}
            </span>
          ))}
        </div>
      ) : null}
      {/* A table ignores sr-only's 1 px width, so the wrapper carries it. */}
      <div className="sr-only">
        <table>
          <caption>{title}</caption>
          <thead>
            <tr>
              <th scope="col">Group</th>
              {stacks.map((s) => (
                <th key={s.key} scope="col">
                  {s.label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {data.map((d) => (
              <tr key={d.label}>
                <th scope="row">{d.label}</th>
                {stacks.map((s) => (
                  <td key={s.key}>{format(value(d, s.key))}</td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </figure>
  );
}
