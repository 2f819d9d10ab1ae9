"use client";

import Link from "next/link";
import { useMemo } from "react";
import type { ColumnDef } from "@tanstack/react-table";
import type { TEstimateRow } from "@/features/estimates/schemas/estimate";
import { useEstimates, DEFAULT_ESTIMATE_LIST } from "@/features/estimates/api/estimates";
import { ServerDataTable } from "@/lib/ui/server-data-table";
import { useUrlListState } from "@/lib/ui/use-url-list-state";
import { formatDate, formatMoney, formatNumber, POSITION_LABELS } from "@/lib/format/format";
import { EmptyState } from "@/lib/ui/empty-state";

const estimateColumns = (currency: string): ColumnDef<TEstimateRow, unknown>[] => [
  {
    id: "title",
    header: "Estimate",
    enableHiding: false,
    cell: ({ row }) => (
      <Link
        href={`/estimates/${row.original.id}`}
        className="font-medium text-furrow-700 hover:underline"
      >
        {row.original.title}
      </Link>
    ),
  },
  {
    id: "customerName",
    header: "Customer",
    enableSorting: false,
    cell: ({ row }) => row.original.customerName ?? "—",
  },
  { id: "machineName", header: "Machine", cell: ({ row }) => row.original.machineName },
  {
    id: "dutyCycleName",
    header: "Duty cycle",
    enableSorting: false,
    cell: ({ row }) => row.original.dutyCycleName,
  },
  {
    id: "costPerHour",
    header: `Tyre cost per hour (${currency})`,
    cell: ({ row }) => formatMoney(row.original.costPerHour, currency),
  },
  {
    id: "hoursToFirstReplacement",
    header: "Hours to first replacement",
    cell: ({ row }) => formatNumber(row.original.hoursToFirstReplacement, 0),
  },
  {
    id: "firstToWear",
    header: "Wears first",
    enableSorting: false,
    cell: ({ row }) => (row.original.firstToWear ? POSITION_LABELS[row.original.firstToWear] : "—"),
  },
  {
    id: "warningCount",
    header: "Warnings",
    enableSorting: false,
    cell: ({ row }) => row.original.warningCount,
  },
  { id: "createdAt", header: "Run on", cell: ({ row }) => formatDate(row.original.createdAt) },
];

export function EstimatesTable({
  canRun,
  currency,
  customerId,
  machineId,
  pageSize,
}: {
  canRun: boolean;
  /** The dealership's ISO 4217 currency. */
  currency: string;
  customerId?: string;
  machineId?: string;
  pageSize?: number;
}) {
  // The customer or machine scope is fixed by the page; page and sort live in the URL ("e_"
  // where the estimates share a page with another table or are a short recent list).
  const scope = { ...(customerId ? { customerId } : {}), ...(machineId ? { machineId } : {}) };
  const [state, setState] = useUrlListState(
    { ...DEFAULT_ESTIMATE_LIST, ...(pageSize ? { pageSize } : {}) },
    { prefix: customerId || machineId || pageSize ? "e_" : "", scope },
  );
  const query = useEstimates(state);
  const columns = useMemo(() => estimateColumns(currency), [currency]);
  return (
    <ServerDataTable
      caption="Estimates"
      columns={columns}
      state={state}
      onStateChange={setState}
      query={query}
      searchLabel="Find an estimate"
      getRowId={(r) => r.id}
      initiallyHidden={["dutyCycleName", "warningCount", ...(customerId ? ["customerName"] : [])]}
      scopeKeys={Object.keys(scope)}
      empty={
        <EmptyState
          title="No estimates yet"
          action={
            canRun ? (
              <Link
                href={`/estimates/new${
                  customerId || machineId
                    ? `?${new URLSearchParams({ ...(customerId ? { customerId } : {}), ...(machineId ? { machineId } : {}) })}`
                    : ""
                }`}
                className="font-medium text-furrow-700 underline"
              >
                Run an estimate
              </Link>
            ) : undefined
          }
        >
          An estimate runs a machine through a duty cycle and stores the result.
        </EmptyState>
      }
    />
  );
}
