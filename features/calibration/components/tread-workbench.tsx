"use client";

import Link from "next/link";
import type { TPositionPrediction, TReadingPoint, TTyrePosition } from "@/lib/calibration";
import { Card } from "@/lib/ui/card";
import { useMachineCalibration } from "@/features/calibration/api/calibration";
import { AlertList } from "@/features/calibration/components/alert-list";
import { CalibrationPanel } from "@/features/calibration/components/calibration-panel";
import { DepthChart } from "@/features/calibration/components/depth-chart";
import { ImportReadings } from "@/features/calibration/components/import-readings";
import { ReadingForm } from "@/features/calibration/components/reading-form";
import { ReadingsTable } from "@/features/calibration/components/readings-table";
import {
  formatDay,
  formatDepth,
  formatHours,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";

const POSITIONS: TTyrePosition[] = ["front-left", "front-right", "rear-left", "rear-right"];

/** A machine's tread: enter readings, see the calibration, the charts, the alerts and the plan. */
export function TreadWorkbench({
  machineId,
  system,
  canRun,
  userName,
}: {
  machineId: string;
  system: TUnitSystem;
  canRun: boolean;
  userName: string;
}) {
  const { data, error, isPending } = useMachineCalibration(machineId);
  if (isPending) return <p>Loading tread readings…</p>;
  if (error || !data) return <p role="alert">Could not load the readings: {error?.message}</p>;
  const points: TReadingPoint[] = data.readings;
  const last = (p: TTyrePosition) => points.filter((r) => r.position === p).at(-1);
  const badges = Object.fromEntries(
    POSITIONS.map((p) => {
      const r = last(p);
      return [p, r ? `${formatDepth(system, r.depthCentre)} · ${r.hourMeter} h` : "no reading"];
    }),
  );
  const fleet = data.fleet;
  const rate = (list: readonly TPositionPrediction[], p: TTyrePosition) =>
    list.find((x) => x.position === p)?.wearPer100h.total ?? null;
  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-col gap-1">
        <Link href={`/machines/${machineId}`} className="text-sm text-furrow-700 underline">
          ← {data.machine.name}
        </Link>
        <h1 className="text-2xl font-bold text-ink-900">Tread and calibration</h1>
      </header>
      {fleet ? <AlertList alerts={fleet.alerts} /> : null}
      {data.canWrite ? (
        <Card title="New reading">
          <ReadingForm
            machineId={machineId}
            system={system}
            badges={badges}
            defaultName={userName}
          />
        </Card>
      ) : null}
      <Card title="Estimate">
        <CalibrationPanel data={data} system={system} canRun={canRun} />
      </Card>
      {fleet && data.tyres ? (
        <Card title="Measured against predicted depth">
          <div className="grid gap-4 sm:grid-cols-2">
            {POSITIONS.map((p) => (
              <DepthChart
                key={p}
                position={p}
                readings={points}
                uncalibratedPer100h={rate(fleet.uncalibrated, p)}
                calibratedPer100h={fleet.calibrated ? rate(fleet.predicted, p) : null}
                replaceDepth={
                  (p.startsWith("front") ? data.tyres!.front : data.tyres!.rear).treadDepthReplace
                }
                system={system}
              />
            ))}
          </div>
        </Card>
      ) : null}
      {fleet ? (
        <Card title="When each tyre comes due">
          <p className="mb-2 text-sm text-ink-700">
            Usage:{" "}
            {fleet.hoursPerWeek
              ? `${fleet.hoursPerWeek.toFixed(1)} h per week from the hour meter`
              : "read the hour meter on two days at least a week apart to date the plan"}
            .
          </p>
          <ul className="divide-y divide-ink-100 text-sm" data-testid="machine-plan">
            {fleet.plan.map((i) => (
              <li
                key={i.position}
                className="flex justify-between gap-2 py-2"
                data-position={i.position}
              >
                <span>
                  {POSITION_NAMES[i.position]} · {i.designation}
                </span>
                <span className="text-right">
                  {i.dueOn ? formatDay(i.dueOn) : "—"}{" "}
                  {i.hoursLeft !== null ? `(${formatHours(i.hoursLeft)} left)` : ""}
                </span>
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
      <Card title="Readings">
        <ReadingsTable readings={data.readings} system={system} canWrite={data.canWrite} />
      </Card>
      {data.canWrite ? (
        <Card title="Import readings from CSV">
          <ImportReadings machineId={machineId} defaultName={userName} />
        </Card>
      ) : null}
    </div>
  );
}
