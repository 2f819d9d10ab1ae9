"use client";

import Link from "next/link";
import { formatPerHour } from "@/lib/format/format";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Caution, EstimateSafetyCaution } from "@/lib/ui/caution";
import { Dialog } from "@/lib/ui/dialog";
import { toast } from "@/lib/ui/toast";
import { SURFACE_LABELS } from "@/lib/duty-cycles/surface-names";
import {
  useDeleteDutyCycle,
  useDutyCycle,
  useRetryDutyCycleImport,
} from "@/features/duty-cycles/api/duty-cycles";
import { ProgressBar } from "@/features/duty-cycles/components/progress-bar";
import { DutyCycleSummary } from "@/features/duty-cycles/components/duty-cycle-summary";

const SOURCE_LABELS = {
  telematics: "Telematics log",
  schedule: "Turn schedule",
  builder: "Built without a file",
} as const;

/** One duty cycle: live import progress, failure and retry, summary charts and the turns. */
export function DutyCycleDetail({ id, canWrite }: { id: string; canWrite: boolean }) {
  const router = useRouter();
  const { data: cycle, error } = useDutyCycle(id);
  const retry = useRetryDutyCycleImport(id);
  const remove = useDeleteDutyCycle();
  const [confirming, setConfirming] = useState(false);
  if (error)
    return (
      <Caution title="Could not load the duty cycle" tone="danger">
        {error.message}
      </Caution>
    );
  if (!cycle) return <p className="text-ink-700">Loading…</p>;
  const working = cycle.status === "pending" || cycle.status === "processing";

  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{cycle.name}</h1>
          <p className="text-sm text-ink-700">
            {cycle.customerName} · {SOURCE_LABELS[cycle.source]}
            {cycle.upload
              ? ` · ${cycle.upload.originalName} (${(cycle.upload.sizeBytes / 1024).toFixed(0)} KB)`
              : ""}
          </p>
        </div>
        {canWrite ? (
          <div className="flex flex-wrap gap-2">
            {cycle.status === "ready" ? (
              <Link
                href={`/estimates/new?customerId=${cycle.customerId}&dutyCycleId=${cycle.id}`}
                className="inline-flex h-9 items-center rounded-md bg-furrow-600 px-3 text-sm font-medium text-white hover:bg-furrow-700"
              >
                Run an estimate with this duty cycle
              </Link>
            ) : null}
            {cycle.source === "builder" && cycle.builderInput ? (
              <Link
                href={`/duty-cycles/${cycle.id}/edit`}
                className="inline-flex h-9 items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-900 hover:bg-ink-50"
              >
                Edit the work
              </Link>
            ) : null}
            <Button variant="danger" size="sm" onClick={() => setConfirming(true)}>
              Delete
            </Button>
          </div>
        ) : null}
      </header>

      {working ? (
        <Card>
          <ProgressBar
            label={
              cycle.status === "pending"
                ? "Waiting for a worker"
                : "Reading the file and finding turns"
            }
            value={cycle.progress}
          />
        </Card>
      ) : null}

      {cycle.interruptions > 0 ? (
        <p className="rounded-md bg-caution-50 px-3 py-2 text-sm text-caution-800" role="status">
          {cycle.status === "ready" ? "Imported on a retry: " : "Retried automatically: "}
          the worker processing this file stopped part-way{" "}
          {cycle.interruptions === 1 ? "once" : `${cycle.interruptions} times`}. Nothing from an
          interrupted attempt was kept.
        </p>
      ) : null}

      {cycle.status === "failed" ? (
        <Caution title="The import failed" tone="danger">
          <p>{cycle.failureReason}</p>
          <div className="mt-3 flex flex-wrap gap-2">
            {cycle.rowsSkipped > 0 ? (
              <a className="font-medium underline" href={`/api/v1/duty-cycles/${id}/bad-rows`}>
                Download the rejected rows (CSV)
              </a>
            ) : null}
            {canWrite ? (
              <Button
                size="sm"
                variant="secondary"
                busy={retry.isPending}
                onClick={() => retry.mutate(undefined, { onError: (e) => toast.error(e.message) })}
              >
                Retry the import
              </Button>
            ) : null}
          </div>
        </Caution>
      ) : null}

      {cycle.status === "ready" && cycle.summary ? (
        <Card title="Summary">
          {cycle.rowsSkipped > 0 ? (
            <div className="mb-4">
              <Caution
                title={
                  cycle.rowsSkipped === 1
                    ? "1 row was skipped"
                    : `${cycle.rowsSkipped.toLocaleString("en-GB")} rows were skipped`
                }
                tone="info"
              >
                {cycle.rowsUsed.toLocaleString("en-GB")} rows were used.{" "}
                <a className="font-medium underline" href={`/api/v1/duty-cycles/${id}/bad-rows`}>
                  Download the skipped rows with the reason for each (CSV)
                </a>
              </Caution>
            </div>
          ) : null}
          {cycle.notes.length > 0 ? (
            <ul className="mb-4 list-disc pl-5 text-sm text-ink-700">
              {cycle.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          ) : null}
          <DutyCycleSummary summary={cycle.summary} />
        </Card>
      ) : null}

      {cycle.status === "ready" ? (
        <Card
          title={`Turns (${cycle.turnCount.toLocaleString("en-GB")}${cycle.turnCount > cycle.turns.length ? `, first ${cycle.turns.length} shown` : ""})`}
        >
          <div className="overflow-x-auto">
            <table className="min-w-full divide-y divide-ink-200 text-sm">
              <caption className="sr-only">Turns of this duty cycle</caption>
              <thead className="bg-ink-100 text-left text-xs uppercase tracking-wide text-ink-700">
                <tr>
                  {[
                    "#",
                    "Turn",
                    "Radius (m)",
                    "Heading change (°)",
                    "Speed (km/h)",
                    "Per hour",
                    "Surface",
                    "Load",
                    "Reverse",
                  ].map((h) => (
                    <th key={h} scope="col" className="px-3 py-2 font-medium">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody className="divide-y divide-ink-100">
                {cycle.turns.map((t) => (
                  <tr key={t.seq}>
                    <td className="px-3 py-1.5">{t.seq}</td>
                    <td className="px-3 py-1.5">{t.label ?? t.direction}</td>
                    <td className="px-3 py-1.5">
                      {t.radius === null ? `steer ${t.steerInput}°` : t.radius.toFixed(1)}
                    </td>
                    <td className="px-3 py-1.5">{t.headingChange.toFixed(0)}</td>
                    <td className="px-3 py-1.5">{(t.speed * 3.6).toFixed(1)}</td>
                    <td className="px-3 py-1.5">{formatPerHour(t.perHour)}</td>
                    <td className="px-3 py-1.5">{SURFACE_LABELS[t.surface]}</td>
                    <td className="px-3 py-1.5">{t.loadState}</td>
                    <td className="px-3 py-1.5">{t.reverse ? "yes" : ""}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </Card>
      ) : null}

      <EstimateSafetyCaution />

      <Dialog
        open={confirming}
        onOpenChange={setConfirming}
        title={`Delete "${cycle.name}"?`}
        description="Its turns and uploaded file are removed for good. A duty cycle used by estimates cannot be deleted."
        footer={
          <>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              busy={remove.isPending}
              onClick={() =>
                remove.mutate(id, {
                  onSuccess: () => {
                    toast.success("Duty cycle deleted.");
                    router.push("/duty-cycles");
                  },
                  onError: (e) => {
                    setConfirming(false);
                    toast.error(e.message);
                  },
                })
              }
            >
              Delete
            </Button>
          </>
        }
      />
    </div>
  );
}
