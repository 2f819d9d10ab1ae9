"use client";

import Link from "next/link";
import type { ColumnDef } from "@tanstack/react-table";
import type { TCustomerRow } from "@/features/customers/schemas/customer";
import { useCustomers, DEFAULT_CUSTOMER_LIST } from "@/features/customers/api/customers";
import { ServerDataTable } from "@/lib/ui/server-data-table";
import { useUrlListState } from "@/lib/ui/use-url-list-state";
import { formatDate } from "@/lib/format/format";
import { EmptyState } from "@/lib/ui/empty-state";
import { Select } from "@/lib/ui/input";
import { CUSTOMER_KINDS } from "@/features/customers/schemas/customer";

const columns: ColumnDef<TCustomerRow, unknown>[] = [
  {
    id: "name",
    header: "Customer",
    enableHiding: false,
    cell: ({ row }) => (
      <Link
        href={`/customers/${row.original.id}`}
        className="font-medium text-furrow-700 hover:underline"
      >
        {row.original.name}
      </Link>
    ),
  },
  { id: "kind", header: "Kind", cell: ({ row }) => row.original.kind },
  {
    id: "contactName",
    header: "Contact",
    enableSorting: false,
    cell: ({ row }) => row.original.contactName ?? "—",
  },
  {
    id: "siteCount",
    header: "Sites",
    enableSorting: false,
    cell: ({ row }) => row.original.siteCount,
  },
  {
    id: "machineCount",
    header: "Machines",
    enableSorting: false,
    cell: ({ row }) => row.original.machineCount,
  },
  { id: "updatedAt", header: "Updated", cell: ({ row }) => formatDate(row.original.updatedAt) },
];

export function CustomersTable({ canWrite }: { canWrite: boolean }) {
  // Page, sort and filters live in the URL: back, forward and shared links keep the view.
  const [state, setState] = useUrlListState(DEFAULT_CUSTOMER_LIST, { filterKeys: ["kind"] });
  const query = useCustomers(state);
  return (
    <ServerDataTable
      caption="Customers"
      columns={columns}
      state={state}
      onStateChange={setState}
      query={query}
      searchLabel="Find a customer"
      getRowId={(r) => r.id}
      initiallyHidden={["updatedAt"]}
      filters={
        <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
          Kind
          <Select
            value={state.filters.kind ?? ""}
            onChange={(e) => {
              const { kind: _old, ...rest } = state.filters;
              const filters = e.target.value ? { ...rest, kind: e.target.value } : rest;
              setState({ ...state, filters, page: 1 });
            }}
          >
            <option value="">All kinds</option>
            {CUSTOMER_KINDS.map((k) => (
              <option key={k} value={k}>
                {k}
              </option>
            ))}
          </Select>
        </label>
      }
      empty={
        <EmptyState
          title="No customers yet"
          action={
            canWrite ? (
              <Link href="/customers/new" className="font-medium text-furrow-700 underline">
                Add the first customer
              </Link>
            ) : undefined
          }
        >
          Customers hold their sites, machines, duty cycles and estimates.
        </EmptyState>
      }
    />
  );
}
