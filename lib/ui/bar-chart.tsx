"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { ChartDataTable, ChartFigure, ChartLegend } from "@/lib/ui/chart-frame";

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
    <ChartFigure
      title={title}
      width={W}
      height={H}
      maxWidth={460}
      after={
        <>
          {stacks.length > 1 ? <ChartLegend items={stacks} /> : null}
          <ChartDataTable
            title={title}
            corner="Group"
            columns={stacks.map((s) => s.label)}
            rows={data.map((d) => ({
              label: d.label,
              cells: stacks.map((s) => format(value(d, s.key))),
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
    </ChartFigure>
  );
}
