"use client";

import { AxisBottom, AxisLeft } from "@visx/axis";
import { GridRows } from "@visx/grid";
import { scaleLinear } from "@visx/scale";
import { LinePath } from "@visx/shape";
import {
  currentFitment,
  meanDepth,
  type TReadingPoint,
  type TTyrePosition,
} from "@/lib/calibration";
import {
  depthFromMm,
  depthUnit,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";

const W = 360;
const H = 240;
const M = { top: 12, right: 12, bottom: 40, left: 48 };

/**
 * Measured mean depth of the tyre now on a position against what the model predicts from its
 * first reading, uncalibrated and calibrated, down to the replacement depth.
 */
export function DepthChart({
  position,
  readings,
  uncalibratedPer100h,
  calibratedPer100h,
  replaceDepth,
  system,
}: {
  position: TTyrePosition;
  readings: readonly TReadingPoint[];
  uncalibratedPer100h: number | null;
  calibratedPer100h: number | null;
  replaceDepth: number;
  system: TUnitSystem;
}) {
  const fitment = currentFitment(readings, position);
  const first = fitment[0];
  if (!first) return null;
  const d0 = meanDepth(first);
  const h0 = first.hourMeter;
  const lastH = fitment.at(-1)!.hourMeter;
  const line = (per100h: number | null) => {
    if (!per100h || per100h <= 0) return [];
    const end = h0 + ((d0 - replaceDepth) / per100h) * 100;
    return [
      { h: h0, d: d0 },
      { h: end, d: replaceDepth },
    ];
  };
  const uncal = line(uncalibratedPer100h);
  const cal = line(calibratedPer100h);
  const hMax = Math.max(lastH + 1, ...[...uncal, ...cal].map((p) => p.h));
  const x = scaleLinear({
    domain: [h0, Math.min(hMax, h0 + 20 * Math.max(1, lastH - h0) + 500)],
    range: [M.left, W - M.right],
    nice: true,
    clamp: true,
  });
  const y = scaleLinear({
    domain: [0, depthFromMm(system, Math.max(d0, ...fitment.map(meanDepth)) * 1.05)],
    range: [H - M.bottom, M.top],
    nice: true,
  });
  const px = (p: { h: number }) => x(p.h);
  const py = (p: { d: number }) => y(depthFromMm(system, p.d));
  const title = `${POSITION_NAMES[position]}: measured and predicted tread depth against hours`;
  return (
    <figure className="flex flex-col gap-1">
      <figcaption className="text-sm font-medium text-ink-800">
        {POSITION_NAMES[position]}
      </figcaption>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={title}
        className="w-full rounded-md border border-ink-200 bg-white"
      >
        <GridRows
          scale={y}
          left={M.left}
          width={W - M.left - M.right}
          className="stroke-ink-100"
          numTicks={5}
        />
        <line
          x1={M.left}
          x2={W - M.right}
          y1={py({ d: replaceDepth })}
          y2={py({ d: replaceDepth })}
          className="stroke-danger-600"
          strokeDasharray="3 3"
        />
        <LinePath
          data={uncal}
          x={px}
          y={py}
          className="stroke-ink-500"
          strokeWidth={2}
          strokeDasharray="6 4"
          fill="none"
        />
        <LinePath
          data={cal}
          x={px}
          y={py}
          className="stroke-furrow-600"
          strokeWidth={2.5}
          fill="none"
        />
        <LinePath
          data={fitment.map((r) => ({ h: r.hourMeter, d: meanDepth(r) }))}
          x={px}
          y={py}
          className="stroke-plum-600"
          strokeWidth={1.5}
          fill="none"
        />
        {fitment.map((r, i) => (
          <circle
            key={i}
            cx={x(r.hourMeter)}
            cy={py({ d: meanDepth(r) })}
            r={4}
            className="fill-plum-600"
          />
        ))}
        <AxisBottom
          top={H - M.bottom}
          scale={x}
          numTicks={5}
          label="Hour meter (h)"
          tickLabelProps={{ fontSize: 10 }}
          labelProps={{ fontSize: 11, textAnchor: "middle" }}
        />
        <AxisLeft
          left={M.left}
          scale={y}
          numTicks={5}
          label={`Depth (${depthUnit(system)})`}
          tickLabelProps={{ fontSize: 10, textAnchor: "end", dx: -4, dy: 3 }}
          labelProps={{ fontSize: 11, textAnchor: "middle" }}
        />
      </svg>
      <div className="flex flex-wrap gap-3 text-xs text-ink-700">
        <span className="text-plum-700">● measured</span>
        <span className="text-ink-600">- - model</span>
        {cal.length ? <span className="text-furrow-700">— calibrated</span> : null}
        <span className="text-danger-700">··· replacement depth</span>
      </div>
    </figure>
  );
}
