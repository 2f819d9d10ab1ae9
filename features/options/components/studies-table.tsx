"use client";

import Link from "next/link";
import { useMemo, useState } from "react";
import type { ColumnDef } from "@tanstack/react-table";
import type { TStudyKind, TStudyRow } from "@/features/options/schemas/study";
import { DEFAULT_STUDY_LIST, useStudies } from "@/features/options/api/studies";
import type { TListState } from "@/lib/query/list-state";
import { ServerDataTable } from "@/lib/ui/server-data-table";
import { EmptyState } from "@/lib/ui/empty-state";
import { formatDate, formatMoney } from "@/lib/format/format";

const HREF: Record<TStudyKind, string> = { comparison: "/comparisons", sweep: "/sweeps" };

const studyColumns = (kind: TStudyKind, currency: string): ColumnDef<TStudyRow, unknown>[] => [
  {
    id: "title",
    header: kind === "comparison" ? "Comparison" : "Sweep",
    enableHiding: false,
    enableSorting: false,
    cell: ({ row }) => (
      <Link
        href={`${HREF[kind]}/${row.original.id}`}
        className="font-medium text-furrow-700 hover:underline"
      >
        {row.original.title}
      </Link>
    ),
  },
  {
    id: "machineName",
    header: "Machine",
    enableSorting: false,
    cell: ({ row }) => row.original.machineName,
  },
  {
    id: "version",
    header: "Version",
    enableSorting: false,
    cell: ({ row }) => row.original.version,
  },
  {
    id: "currentCostPerHour",
    header: `Today per hour (${currency})`,
    enableSorting: false,
    cell: ({ row }) => formatMoney(row.original.currentCostPerHour, currency),
  },
  {
    id: "bestCostPerHour",
    header: `Best per hour (${currency})`,
    enableSorting: false,
    cell: ({ row }) => formatMoney(row.original.bestCostPerHour, currency),
  },
  {
    id: "createdAt",
    header: "Run on",
    enableSorting: false,
    cell: ({ row }) => formatDate(row.original.createdAt),
  },
];

/** Stored comparisons or sweeps of one machine or customer, newest first. */
export function StudiesTable({
  kind,
  currency,
  machineId,
  customerId,
}: {
  kind: TStudyKind;
  /** The dealership's ISO 4217 currency. */
  currency: string;
  machineId?: string;
  customerId?: string;
}) {
  const [state, setState] = useState<TListState>({
    ...DEFAULT_STUDY_LIST,
    filters: { ...(customerId ? { customerId } : {}), ...(machineId ? { machineId } : {}) },
  });
  const query = useStudies(kind, state);
  const columns = useMemo(() => studyColumns(kind, currency), [kind, currency]);
  return (
    <ServerDataTable
      caption={kind === "comparison" ? "Comparisons" : "Sweeps"}
      columns={columns}
      state={state}
      onStateChange={setState}
      query={query}
      searchLabel={kind === "comparison" ? "Find a comparison" : "Find a sweep"}
      getRowId={(r) => r.id}
      initiallyHidden={machineId ? ["machineName"] : []}
      scopeKeys={["customerId", "machineId"]}
      empty={
        <EmptyState title={kind === "comparison" ? "No comparisons yet" : "No sweeps yet"}>
          {kind === "comparison"
            ? "Open an estimate and choose “Try another setup” to compare options."
            : "Open an estimate and choose “Sweep a setting” to chart cost against one setting."}
        </EmptyState>
      }
    />
  );
}
