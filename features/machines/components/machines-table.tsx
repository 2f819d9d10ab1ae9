"use client";

import Link from "next/link";
import type { ColumnDef } from "@tanstack/react-table";
import { STEERING_LAYOUTS, type TSteeringLayout } from "@/lib/scrub";
import type { TMachineRow } from "@/features/machines/schemas/machine";
import { useMachines, DEFAULT_MACHINE_LIST } from "@/features/machines/api/machines";
import { ServerDataTable } from "@/lib/ui/server-data-table";
import { useUrlListState } from "@/lib/ui/use-url-list-state";
import { formatDate } from "@/lib/format/format";
import { LAYOUT_LABELS } from "@/features/machines/lib/steering-layouts";
import { EmptyState } from "@/lib/ui/empty-state";
import { Select } from "@/lib/ui/input";

const columns: ColumnDef<TMachineRow, unknown>[] = [
  {
    id: "name",
    header: "Machine",
    enableHiding: false,
    cell: ({ row }) => (
      <Link
        href={`/machines/${row.original.id}`}
        className="font-medium text-furrow-700 hover:underline"
      >
        {row.original.name}
      </Link>
    ),
  },
  {
    id: "customerName",
    header: "Customer",
    cell: ({ row }) => row.original.customerName ?? "Dealership template",
  },
  { id: "kind", header: "Kind", cell: ({ row }) => row.original.kind },
  {
    id: "layout",
    header: "Steering",
    cell: ({ row }) => LAYOUT_LABELS[row.original.layout as TSteeringLayout] ?? row.original.layout,
  },
  {
    id: "estimateCount",
    header: "Estimates",
    enableSorting: false,
    cell: ({ row }) => row.original.estimateCount,
  },
  {
    id: "version",
    header: "Version",
    enableSorting: false,
    cell: ({ row }) => row.original.version,
  },
  { id: "updatedAt", header: "Updated", cell: ({ row }) => formatDate(row.original.updatedAt) },
];

export function MachinesTable({
  canWrite,
  customerId,
  templatesOnly = false,
}: {
  canWrite: boolean;
  customerId?: string;
  templatesOnly?: boolean;
}) {
  // The customer (or templates-only) scope is fixed by the page; the user's page, sort and
  // filters live in the URL ("m_" on a customer page, which also shows its estimates).
  const scope = {
    ...(customerId ? { customerId } : {}),
    ...(templatesOnly ? { template: "true" } : {}),
  };
  const [state, setState] = useUrlListState(DEFAULT_MACHINE_LIST, {
    prefix: customerId ? "m_" : "",
    filterKeys: templatesOnly ? ["layout"] : ["layout", "template"],
    scope,
  });
  const query = useMachines(state);
  const setFilter = (key: string, value: string) => {
    const filters = { ...state.filters };
    if (value) filters[key] = value;
    else delete filters[key];
    setState({ ...state, filters, page: 1 });
  };
  return (
    <ServerDataTable
      caption={templatesOnly ? "Dealership templates" : "Machines"}
      columns={columns}
      state={state}
      onStateChange={setState}
      query={query}
      searchLabel="Find a machine"
      getRowId={(r) => r.id}
      initiallyHidden={["version", "updatedAt", ...(customerId ? ["customerName"] : [])]}
      scopeKeys={Object.keys(scope)}
      filters={
        <>
          <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
            Steering
            <Select
              value={state.filters.layout ?? ""}
              onChange={(e) => setFilter("layout", e.target.value)}
            >
              <option value="">All layouts</option>
              {STEERING_LAYOUTS.map((l) => (
                <option key={l} value={l}>
                  {LAYOUT_LABELS[l]}
                </option>
              ))}
            </Select>
          </label>
          {!customerId && !templatesOnly ? (
            <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
              Owner
              <Select
                value={state.filters.template ?? ""}
                onChange={(e) => setFilter("template", e.target.value)}
              >
                <option value="">Customers and templates</option>
                <option value="false">Customers&apos; machines</option>
                <option value="true">Dealership templates</option>
              </Select>
            </label>
          ) : null}
        </>
      }
      empty={
        <EmptyState
          title={templatesOnly ? "No templates yet" : "No machines yet"}
          action={
            canWrite ? (
              <Link
                href={customerId ? `/machines/new?customerId=${customerId}` : "/machines/new"}
                className="font-medium text-furrow-700 underline"
              >
                Add a machine
              </Link>
            ) : undefined
          }
        >
          A machine profile holds the steering layout, axle loads and tyres the engine needs.
        </EmptyState>
      }
    />
  );
}
