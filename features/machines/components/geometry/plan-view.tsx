"use client";

import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import type { TMachine } from "@/lib/scrub";
import type { TPlanView } from "@/features/machines/lib/steer-geometry";

const W = 420;
const H = 420;
const PAD = 28;

/** Screen position of body-frame (x forward, y left): forward is up the screen. */
function project(view: TPlanView, machine: TMachine) {
  const size = Math.max(machine.wheelbase, machine.axles.front.track, machine.axles.rear.track);
  const reach = size * 4;
  const near = view.centres.filter((c) => Math.hypot(c.x, c.y) < reach);
  const xs = [...view.wheels.map((w) => w.x), ...near.map((c) => c.x)];
  const ys = [...view.wheels.map((w) => w.y), ...near.map((c) => c.y)];
  const margin = size * 0.35;
  const minX = Math.min(...xs) - margin;
  const maxX = Math.max(...xs) + margin;
  const minY = Math.min(...ys) - margin;
  const maxY = Math.max(...ys) + margin;
  const span = Math.max(maxX - minX, maxY - minY);
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  const sx = scaleLinear({ domain: [cy + span / 2, cy - span / 2], range: [PAD, W - PAD] });
  const sy = scaleLinear({ domain: [cx + span / 2, cx - span / 2], range: [PAD, H - PAD] });
  return {
    toScreen: (x: number, y: number) => [sx(y), sy(x)] as const,
    pxPerM: (W - 2 * PAD) / span,
    reach,
    near,
  };
}

/** Plan view: axles, each wheel at its heading, spin-axis lines and the turning centre(s). */
export function PlanView({
  machine,
  view,
  tyreSize,
}: {
  machine: TMachine;
  view: TPlanView;
  /** Tyre footprint to draw per axle (m): length = overall diameter, width = section width. */
  tyreSize: { front: { length: number; width: number }; rear: { length: number; width: number } };
}) {
  const { toScreen, pxPerM, near } = project(view, machine);
  const wheel = (pos: string) => view.wheels.find((w) => w.position === pos)!;
  const axleLine = (a: string, b: string) => {
    const [x1, y1] = toScreen(wheel(a).x, wheel(a).y);
    const [x2, y2] = toScreen(wheel(b).x, wheel(b).y);
    return <line x1={x1} y1={y1} x2={x2} y2={y2} className="stroke-ink-500" strokeWidth={3} />;
  };
  const mid = (a: string, b: string) => ({
    x: (wheel(a).x + wheel(b).x) / 2,
    y: (wheel(a).y + wheel(b).y) / 2,
  });
  const fm = mid("front-left", "front-right");
  const rm = mid("rear-left", "rear-right");
  const frameEnd = view.pivot ?? fm;
  const [fx1, fy1] = toScreen(rm.x, rm.y);
  const [fx2, fy2] = toScreen(frameEnd.x, frameEnd.y);
  const [px, py] = view.pivot ? toScreen(view.pivot.x, view.pivot.y) : [0, 0];
  const [fmx, fmy] = toScreen(fm.x, fm.y);
  const offView = view.centres.filter((c) => !near.includes(c));

  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-labelledby="plan-title"
      className="w-full max-w-[420px] rounded-md border border-ink-200 bg-white"
    >
      <title id="plan-title">
        Plan view of the machine with wheel headings and turning centres, front at the top
      </title>
      <Group>
        <line
          x1={fx1}
          y1={fy1}
          x2={fx2}
          y2={fy2}
          className="stroke-ink-300"
          strokeWidth={8}
          strokeLinecap="round"
        />
        {view.pivot ? (
          <>
            <line
              x1={px}
              y1={py}
              x2={fmx}
              y2={fmy}
              className="stroke-ink-300"
              strokeWidth={8}
              strokeLinecap="round"
            />
            <circle cx={px} cy={py} r={5} className="fill-ink-600" />
          </>
        ) : null}
        {axleLine("front-left", "front-right")}
        {axleLine("rear-left", "rear-right")}
        {view.wheels.map((w) => {
          const [x, y] = toScreen(w.x, w.y);
          const size = w.position.startsWith("front") ? tyreSize.front : tyreSize.rear;
          const len = size.length * pxPerM;
          const wid = Math.max(3, size.width * pxPerM);
          return (
            <g key={w.position} transform={`translate(${x} ${y}) rotate(${-w.heading})`}>
              <rect
                x={-wid / 2}
                y={-len / 2}
                width={wid}
                height={len}
                rx={2}
                className="fill-ink-800"
              />
              <line
                x1={0}
                y1={-len / 2}
                x2={0}
                y2={-len / 2 - 10}
                className="stroke-furrow-600"
                strokeWidth={2}
              />
            </g>
          );
        })}
        {view.centres.length > 0 && near.length > 0
          ? view.wheels
              .filter((w) => Math.abs(w.heading) > 1e-6 || view.centres.length === 1)
              .map((w) =>
                near.map((c) => {
                  const [x1, y1] = toScreen(w.x, w.y);
                  const [x2, y2] = toScreen(c.x, c.y);
                  return (
                    <line
                      key={`${w.position}-${c.label}`}
                      x1={x1}
                      y1={y1}
                      x2={x2}
                      y2={y2}
                      className="stroke-furrow-200"
                      strokeDasharray="4 4"
                    />
                  );
                }),
              )
          : null}
        {near.map((c, i) => {
          const [x, y] = toScreen(c.x, c.y);
          return (
            <g key={c.label}>
              <circle
                cx={x}
                cy={y}
                r={5}
                className={i === 0 ? "fill-plum-600" : "fill-caution-800"}
              />
              <text x={x + 8} y={y - 8 - i * 14} className="fill-ink-800 text-[11px]">
                {c.label}
              </text>
            </g>
          );
        })}
        {view.crabHeading !== null ? (
          <text x={12} y={20} className="fill-ink-800 text-[12px]">
            Travels sideways-on at {view.crabHeading.toFixed(1)}°: no turning centre
          </text>
        ) : null}
        {offView.length > 0 ? (
          <text x={12} y={H - 10} className="fill-ink-700 text-[11px]">
            Turning centre off the drawing, {offView[0]!.y.toFixed(1)} m to the left
          </text>
        ) : null}
      </Group>
    </svg>
  );
}
