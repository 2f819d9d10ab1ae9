"use client";

import { AxisBottom } from "@visx/axis";
import { GridColumns } from "@visx/grid";
import { scaleBand, scaleTime } from "@visx/scale";
import type { TPlanItem } from "@/lib/calibration";
import { formatDay, POSITION_NAMES } from "@/features/calibration/components/format";

const W = 720;
const ROW = 26;
const M = { top: 8, right: 16, bottom: 36, left: 190 };

const toDate = (iso: string) => new Date(`${iso}T00:00:00Z`);

/** One row per machine, a marker per tyre on its due date; overdue tyres sit on today's line. */
export function PlanTimeline({
  items,
  today,
  until,
}: {
  items: readonly TPlanItem[];
  today: string;
  until: string;
}) {
  const dated = items.filter((i) => i.dueOn && i.dueOn <= until);
  const machines = [...new Map(dated.map((i) => [i.machineId, i])).values()];
  if (machines.length === 0)
    return <p className="text-ink-700">No tyre comes due in this period.</p>;
  const H = M.top + M.bottom + ROW * machines.length;
  const x = scaleTime({ domain: [toDate(today), toDate(until)], range: [M.left, W - M.right] });
  const y = scaleBand({
    domain: machines.map((m) => m.machineId),
    range: [M.top, H - M.bottom],
    padding: 0.2,
  });
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label="Timeline of tyres coming due"
      className="w-full min-w-[36rem] rounded-md border border-ink-200 bg-white"
    >
      <GridColumns
        scale={x}
        top={M.top}
        height={H - M.top - M.bottom}
        className="stroke-ink-100"
        numTicks={6}
      />
      {machines.map((m) => (
        <text
          key={m.machineId}
          x={M.left - 8}
          y={(y(m.machineId) ?? 0) + y.bandwidth() / 2 + 4}
          textAnchor="end"
          fontSize={11}
          className="fill-ink-800"
        >
          {`${m.machineName}${m.customerName ? ` · ${m.customerName}` : ""}`.slice(0, 30)}
        </text>
      ))}
      {dated.map((i) => {
        const on = i.dueOn! < today ? today : i.dueOn!;
        const cx = x(toDate(on));
        const cy = (y(i.machineId) ?? 0) + y.bandwidth() / 2;
        return (
          <g key={`${i.machineId}-${i.position}`}>
            <title>{`${i.machineName}, ${POSITION_NAMES[i.position]}: ${i.designation}, due ${formatDay(i.dueOn)}`}</title>
            <rect
              x={cx - 5}
              y={cy - 7}
              width={10}
              height={14}
              rx={2}
              className={
                i.dueOn! <= today
                  ? "fill-danger-600"
                  : i.position.startsWith("front")
                    ? "fill-furrow-600"
                    : "fill-plum-600"
              }
            />
          </g>
        );
      })}
      <AxisBottom
        top={H - M.bottom}
        scale={x}
        numTicks={6}
        tickFormat={(d) =>
          (d as Date).toLocaleDateString("en-GB", {
            month: "short",
            year: "2-digit",
            timeZone: "UTC",
          })
        }
        tickLabelProps={{ fontSize: 10 }}
      />
    </svg>
  );
}
