"use client";

import { useId, useMemo, useState } from "react";
import {
  minimumTurningDiameter,
  tyreDimensions,
  type TMachine,
  type TSteeringLayout,
} from "@/lib/scrub";
import { LAYOUT_LABELS } from "@/features/machines/lib/steering-layouts";
import { lockCurve, planView, steerInputRange } from "@/features/machines/lib/steer-geometry";
import { formatQuantity, fromSi, unitLabel, type TUnitSystem } from "@/lib/format/units";
import { LineChart } from "@/features/machines/components/geometry/lock-chart";
import { PlanView } from "@/features/machines/components/geometry/plan-view";

function footprint(axle: TMachine["axles"]["front"]) {
  let length = 1.2;
  let width = 0.4;
  try {
    const d = tyreDimensions(axle.tyre.designation);
    length = (axle.tyre.overallDiameter ?? d.overallDiameter) / 1000;
    width = (axle.tyre.sectionWidth ?? d.sectionWidth) / 1000;
  } catch {
    // An unreadable size is reported on the field; draw a generic tyre meanwhile.
  }
  return { length, width };
}

/**
 * Live geometry of a machine: plan view at a chosen steer input, the outer-versus-inner angle
 * curve against the Ackermann ideal across the lock range, percent Ackermann and turning diameter;
 * a machine with several steering modes (four-wheel and crab...) shows one at a time.
 */
export function GeometryView({ machine, system }: { machine: TMachine; system: TUnitSystem }) {
  const modes = [machine.steering, ...machine.otherSteeringModes];
  const [layout, setLayout] = useState(machine.steering.layout);
  const selectId = useId();
  const chosen = modes.find((m) => m.layout === layout) ?? machine.steering;
  const modeMachine = useMemo(
    () => ({ ...machine, steering: chosen, otherSteeringModes: [] }),
    [machine, chosen],
  );
  return (
    <section
      aria-label="Steering geometry"
      className="flex flex-col gap-4"
      data-testid="geometry-view"
    >
      {modes.length > 1 ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={selectId} className="text-sm font-medium text-ink-800">
            Steering mode shown
          </label>
          <select
            id={selectId}
            value={chosen.layout}
            onChange={(e) => setLayout(e.target.value as TSteeringLayout)}
            className="h-11 max-w-[420px] rounded-md border border-ink-300 bg-white px-3"
          >
            {modes.map((m) => (
              <option key={m.layout} value={m.layout}>
                {LAYOUT_LABELS[m.layout]}
              </option>
            ))}
          </select>
        </div>
      ) : null}
      <ModeGeometry key={chosen.layout} machine={modeMachine} system={system} />
    </section>
  );
}

function ModeGeometry({ machine, system }: { machine: TMachine; system: TUnitSystem }) {
  const range = steerInputRange(machine.steering);
  const [fraction, setFraction] = useState(0.6);
  const input = range.max * fraction;
  const sliderId = useId();
  const view = useMemo(() => planView(machine, input), [machine, input]);
  // At full lock the engine solves the real turn (tyre forces decide the centre where wheels disagree).
  const fullDiameter = useMemo(() => {
    try {
      return minimumTurningDiameter({ machine });
    } catch {
      return planView(machine, range.max).turningDiameter;
    }
  }, [machine, range.max]);
  const curve = useMemo(() => lockCurve(machine), [machine]);
  const sizes = useMemo(
    () => ({ front: footprint(machine.axles.front), rear: footprint(machine.axles.rear) }),
    [machine],
  );
  const distUnit = unitLabel(system, "distance-m");

  const diameterCurve = useMemo(() => {
    if (curve) return null;
    const pts: { x: number; y: number }[] = [];
    for (let i = 1; i <= 30; i++) {
      const v = (range.max * i) / 30;
      const d = planView(machine, v).turningDiameter;
      if (d !== null) pts.push({ x: v, y: fromSi(system, "distance-m", d) });
    }
    return pts;
  }, [curve, machine, range.max, system]);

  const inputText =
    range.unit === "deg" ? `${input.toFixed(1)}°` : formatQuantity(system, "distance-m", input, 1);

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-1">
        <label htmlFor={sliderId} className="text-sm font-medium text-ink-800">
          {range.label}: <output>{inputText}</output>
        </label>
        <input
          id={sliderId}
          type="range"
          min={0}
          max={1}
          step={0.01}
          value={fraction}
          onChange={(e) => setFraction(Number(e.target.value))}
          className="w-full max-w-[420px] accent-furrow-600"
        />
      </div>
      <dl className="grid max-w-[420px] grid-cols-2 gap-2 text-sm">
        <div className="rounded-md bg-ink-50 p-2">
          <dt className="text-ink-600">Turning diameter here</dt>
          <dd className="text-lg font-medium" data-testid="turning-diameter">
            {view.turningDiameter === null
              ? "—"
              : formatQuantity(system, "distance-m", view.turningDiameter, 1)}
          </dd>
        </div>
        <div className="rounded-md bg-ink-50 p-2">
          <dt className="text-ink-600">Turning diameter at full lock (ISO 7457)</dt>
          <dd className="text-lg font-medium" data-testid="full-lock-diameter">
            {fullDiameter === null ? "—" : formatQuantity(system, "distance-m", fullDiameter, 1)}
          </dd>
        </div>
        {curve ? (
          <div className="col-span-2 rounded-md bg-ink-50 p-2">
            <dt className="text-ink-600">Ackermann at full lock ({curve.fullLock.toFixed(0)}°)</dt>
            <dd className="text-lg font-medium" data-testid="percent-ackermann">
              {curve.percentAckermannAtFullLock === null
                ? "Linkage cannot reach full lock"
                : `${curve.percentAckermannAtFullLock.toFixed(0)} %`}
            </dd>
            <dd className="text-xs text-ink-600">
              100 × (inside − outside angle) ÷ the same difference for ideal Ackermann: 100 % is
              ideal, 0 % is equal angles.
            </dd>
          </div>
        ) : null}
      </dl>
      <PlanView machine={machine} view={view} tyreSize={sizes} />
      {curve ? (
        <LineChart
          title="Outside wheel angle against inside wheel angle across the lock range"
          xLabel="Inside wheel angle (°)"
          yLabel="Outside wheel angle (°)"
          markerX={range.unit === "deg" ? input : undefined}
          series={[
            {
              label: "This machine",
              points: curve.points.map((p) => ({ x: p.inner, y: p.outer ?? Number.NaN })),
              className: "stroke-furrow-600",
            },
            {
              label: "Ideal (Ackermann)",
              points: curve.points.map((p) => ({ x: p.inner, y: p.ideal })),
              className: "stroke-plum-600",
              dashed: true,
            },
          ]}
        />
      ) : diameterCurve ? (
        <LineChart
          title="Turning diameter across the steer range"
          xLabel={`${range.label} (${range.unit === "deg" ? "°" : "m"})`}
          yLabel={`Turning diameter (${distUnit})`}
          markerX={input}
          series={[
            { label: "Turning diameter", points: diameterCurve, className: "stroke-furrow-600" },
          ]}
        />
      ) : null}
      <p className="max-w-prose text-xs text-ink-600">
        Geometry only: where the wheels do not share one centre, the estimate finds the actual
        turning centre from the tyre forces. Check lock stops and turning circles against the
        machine maker&apos;s figures.
      </p>
    </div>
  );
}
