"use client";

import { Axis, BarSeries, Grid, XYChart, buildChartTheme } from "@visx/xychart";

const theme = buildChartTheme({
  backgroundColor: "#ffffff",
  colors: ["#4740b3"],
  gridColor: "#d5d9e0",
  gridColorDark: "#b0b7c3",
  tickLength: 4,
  svgLabelSmall: { fill: "#3a4150", fontSize: 11 },
  svgLabelBig: { fill: "#161a22", fontSize: 12 },
});

export type TBar = { label: string; value: number };

/**
 * A bar chart (visx xychart) with its figures repeated in a table for screen readers. It takes
 * the width of its column (three charts side by side on a laptop) unless given one, and tilts
 * long category names so none is cut off or runs into its neighbour.
 */
export function SummaryBarChart({
  title,
  bars,
  valueLabel,
  format = (v) => v.toFixed(1),
  width,
}: {
  title: string;
  bars: TBar[];
  valueLabel: string;
  format?: (v: number) => string;
  width?: number;
}) {
  const tilt = bars.length > 8 || bars.some((b) => b.label.length > 9);
  return (
    <figure className="flex min-w-0 flex-col gap-2">
      <figcaption className="text-sm font-medium text-ink-900">{title}</figcaption>
      <div className="min-w-0" aria-hidden>
        <XYChart
          theme={theme}
          width={width}
          height={tilt ? 268 : 240}
          margin={{ top: 10, right: 16, bottom: tilt ? 92 : 56, left: 52 }}
          xScale={{ type: "band", paddingInner: 0.25 }}
          yScale={{ type: "linear", nice: true, zero: true }}
        >
          <Grid columns={false} numTicks={4} />
          <BarSeries
            dataKey={title}
            data={bars}
            xAccessor={(b) => b.label}
            yAccessor={(b) => b.value}
          />
          <Axis
            orientation="bottom"
            tickLabelProps={{
              angle: tilt ? -40 : 0,
              textAnchor: tilt ? "end" : "middle",
            }}
          />
          <Axis orientation="left" numTicks={4} label={valueLabel} />
        </XYChart>
      </div>
      <table className="sr-only">
        <caption>{title}</caption>
        <tbody>
          {bars.map((b) => (
            <tr key={b.label}>
              <th scope="row">{b.label}</th>
              <td>
                {format(b.value)} {valueLabel}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}
