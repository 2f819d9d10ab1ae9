"use client";

import Link from "next/link";
import type { ReactNode } from "react";
import { useDeleteMachine, useMachine } from "@/features/machines/api/machines";
import type { TUnitSystem } from "@/lib/format/units";
import { MachineForm } from "@/features/machines/components/machine-form/machine-form";
import { DeleteButton } from "@/lib/ui/delete-button";
import { CopyToCustomer } from "@/features/machines/components/copy-to-customer";

/** One machine: its profile form with live geometry, copy and delete; `children` (its estimates) below. */
export function MachineDetail({
  id,
  customers,
  system,
  canWrite,
  canRun,
  children,
}: {
  id: string;
  customers: { id: string; name: string }[];
  system: TUnitSystem;
  canWrite: boolean;
  canRun: boolean;
  children?: ReactNode;
}) {
  const machine = useMachine(id);
  const remove = useDeleteMachine();
  if (machine.isPending) return <p className="text-ink-600">Loading machine…</p>;
  if (machine.isError)
    return (
      <p role="alert" className="text-danger-700">
        This machine could not be loaded: {machine.error.message}
      </p>
    );
  const m = machine.data;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{m.name}</h1>
          <p className="text-ink-700">
            {m.customerId ? (
              <Link href={`/customers/${m.customerId}`} className="text-furrow-700 hover:underline">
                {m.customerName}
              </Link>
            ) : (
              "Dealership template"
            )}{" "}
            · {m.kind} · version {m.version}
          </p>
        </div>
        <div className="flex flex-wrap items-end gap-2">
          {canRun && m.customerId ? (
            <Link
              href={`/estimates/new?customerId=${m.customerId}&machineId=${m.id}`}
              className="inline-flex h-9 items-center rounded-md bg-furrow-600 px-3 text-sm font-medium text-white hover:bg-furrow-700"
            >
              Run an estimate
            </Link>
          ) : null}
          {canWrite && !m.customerId && customers.length > 0 ? (
            <CopyToCustomer machineId={m.id} machineName="this template" customers={customers} />
          ) : null}
          {canWrite ? (
            <DeleteButton
              what={m.name}
              consequences="Its estimates are deleted with it; duty cycles stay with the customer."
              onDelete={() => remove.mutateAsync(m.id)}
              redirectTo="/machines"
            />
          ) : null}
        </div>
      </header>
      <MachineForm
        key={m.version}
        machine={m}
        customers={customers}
        system={system}
        readOnly={!canWrite}
      />
      {children}
    </div>
  );
}
