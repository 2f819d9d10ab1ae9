"use client";

import { useState } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import type { TPositionPrediction } from "@/lib/calibration";
import { Button } from "@/lib/ui/button";
import { Caution } from "@/lib/ui/caution";
import { toast } from "@/lib/ui/toast";
import { ApiError } from "@/lib/query/api-fetch";
import { useCreateCalibratedEstimate } from "@/features/calibration/api/calibration";
import type { TMachineCalibrationDto } from "@/features/calibration/schemas/calibration";
import {
  formatHours,
  formatMoney,
  formatRate,
  POSITION_NAMES,
  type TUnitSystem,
} from "@/features/calibration/components/format";

/** The machine's estimate uncalibrated or calibrated, with the fit that calibrates it. */
export function CalibrationPanel({
  data,
  system,
  canRun,
}: {
  data: TMachineCalibrationDto;
  system: TUnitSystem;
  canRun: boolean;
}) {
  const [mode, setMode] = useState<"calibrated" | "uncalibrated">("calibrated");
  const save = useCreateCalibratedEstimate(data.machine.id);
  const router = useRouter();
  const fleet = data.fleet;
  if (!data.basis || !fleet) {
    return (
      <p className="text-ink-700">
        Run an estimate for this machine first: calibration scales the wear it predicts per tyre.{" "}
        <Link className="text-furrow-700 underline" href="/estimates/new">
          Run an estimate
        </Link>
      </p>
    );
  }
  const c = fleet.calibration;
  const calibrated = c !== null && c.source !== "none";
  const shown: TPositionPrediction[] =
    mode === "calibrated" && calibrated ? fleet.predicted : fleet.uncalibrated;
  return (
    <div className="flex flex-col gap-4">
      {calibrated ? (
        <div
          role="group"
          aria-label="Estimate shown"
          className="inline-flex w-fit rounded-md border border-ink-300"
        >
          {(["calibrated", "uncalibrated"] as const).map((m) => (
            <button
              key={m}
              type="button"
              aria-pressed={mode === m}
              onClick={() => setMode(m)}
              className={`h-11 px-4 ${mode === m ? "bg-furrow-600 text-white" : "bg-white text-ink-800"}`}
            >
              {m === "calibrated" ? "Calibrated" : "Model only"}
            </button>
          ))}
        </div>
      ) : null}
      <p className="text-sm font-medium" data-testid="calibration-status">
        {calibrated && mode === "calibrated"
          ? `Calibrated from ${c.source === "machine" ? "this machine's readings" : `the readings of ${c.pooledMachines} other machine${c.pooledMachines === 1 ? "" : "s"} with the same tyres and ground`}.`
          : "Not calibrated: the wear model as published."}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[28rem] text-sm">
          <thead>
            <tr className="text-left text-ink-600">
              <th className="py-1 pr-2">Position</th>
              <th className="py-1 pr-2">Wear</th>
              <th className="py-1 pr-2">Tread life</th>
              <th className="py-1">Tyre cost</th>
            </tr>
          </thead>
          <tbody>
            {shown.map((p) => (
              <tr key={p.position} className="border-t border-ink-100" data-position={p.position}>
                <td className="py-2 pr-2">{POSITION_NAMES[p.position]}</td>
                <td className="py-2 pr-2" data-testid={`wear-${p.position}`}>
                  {formatRate(system, p.wearPer100h.total)}
                </td>
                <td className="py-2 pr-2">{formatHours(p.hoursToReplacement)}</td>
                <td className="py-2">
                  {p.costPerHour === null
                    ? "—"
                    : `${formatMoney(p.costPerHour, data.currency)} per h`}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {c && c.source !== "none" ? (
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-3">
          <dt className="text-ink-600">Rolling-wear factor</dt>
          <dd>× {c.multipliers.base.toFixed(2)}</dd>
          <dt className="text-ink-600">Scrub-wear factor</dt>
          <dd>× {c.multipliers.scrub.toFixed(2)}</dd>
          <dt className="text-ink-600">Intervals measured</dt>
          <dd>{c.fit.quality.n}</dd>
          <dt className="text-ink-600">Tyre-hours covered</dt>
          <dd>{formatHours(c.fit.quality.hoursCovered)}</dd>
          <dt className="text-ink-600">R² (fit quality)</dt>
          <dd>{c.fit.quality.r2.toFixed(2)}</dd>
          <dt className="text-ink-600">Typical miss</dt>
          <dd>{c.fit.quality.rmse.toFixed(2)} mm per interval</dd>
        </dl>
      ) : null}
      {c && c.source === "pooled" && c.ownRefusal ? (
        <p className="text-sm text-ink-700">This machine alone: {c.ownRefusal.reason}</p>
      ) : null}
      {c && c.source === "none" ? (
        <Caution title="Not calibrated yet" tone="info">
          <p>{c.own.reason}</p>
          {c.pooled ? (
            <p className="mt-1">
              Machines with the same tyres and ground together: {c.pooled.reason}
            </p>
          ) : null}
        </Caution>
      ) : null}
      {calibrated && canRun ? (
        <Button
          variant="secondary"
          busy={save.isPending}
          onClick={async () => {
            try {
              const { id } = await save.mutateAsync();
              toast.success("Calibrated estimate saved.", {
                action: {
                  label: "Open",
                  onClick: () => router.push(`/estimates/${id}`),
                },
              });
            } catch (e) {
              toast.error(
                e instanceof ApiError ? e.message : "Could not save the calibrated estimate.",
              );
            }
          }}
        >
          Save as a calibrated estimate
        </Button>
      ) : null}
    </div>
  );
}
