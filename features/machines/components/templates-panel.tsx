"use client";

import Link from "next/link";
import type { TSteeringLayout } from "@/lib/scrub";
import { EmptyState } from "@/lib/ui/empty-state";
import { useMachines } from "@/features/machines/api/machines";
import { listState } from "@/lib/query/list-state";
import { LAYOUT_LABELS } from "@/features/machines/lib/steering-layouts";
import { CopyToCustomer } from "@/features/machines/components/copy-to-customer";

const TEMPLATES = listState({ sort: "name", pageSize: 100, filters: { template: "true" } });

export function TemplatesPanel({
  customers,
  canWrite,
}: {
  customers: { id: string; name: string }[];
  canWrite: boolean;
}) {
  const templates = useMachines(TEMPLATES);
  if (templates.isPending) return <p className="text-ink-600">Loading templates…</p>;
  if (templates.isError)
    return (
      <p role="alert" className="text-danger-700">
        Templates could not be loaded: {templates.error.message}
      </p>
    );
  if (templates.data.items.length === 0)
    return (
      <EmptyState
        title="No templates yet"
        action={
          canWrite ? (
            <Link href="/machines/new" className="font-medium text-furrow-700 underline">
              Add a machine with no owner
            </Link>
          ) : undefined
        }
      >
        A machine saved with the owner “Dealership template” appears here.
      </EmptyState>
    );
  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {templates.data.items.map((m) => (
        <li
          key={m.id}
          className="flex flex-col gap-3 rounded-lg border border-ink-200 bg-white p-4"
        >
          <div>
            <Link
              href={`/machines/${m.id}`}
              className="text-lg font-medium text-furrow-700 hover:underline"
            >
              {m.name}
            </Link>
            <p className="text-sm text-ink-600">
              {m.kind} · {LAYOUT_LABELS[m.layout as TSteeringLayout] ?? m.layout}
            </p>
          </div>
          {canWrite && customers.length > 0 ? (
            <CopyToCustomer machineId={m.id} machineName={m.name} customers={customers} />
          ) : null}
        </li>
      ))}
    </ul>
  );
}
