"use client";

import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
  type VisibilityState,
} from "@tanstack/react-table";
import { useId, useState, type ReactNode } from "react";
import type { TPage } from "@/lib/query/list-query";
import type { TListState } from "@/lib/query/list-state";
import { useSearchBox } from "@/lib/ui/use-search-box";
import { Button } from "@/lib/ui/button";
import { DataTableShell } from "@/lib/ui/data-table-shell";
import { PageButtons } from "@/lib/ui/pager";
import { Input, Select } from "@/lib/ui/input";

type TQueryLike<T> = {
  data: TPage<T> | undefined;
  isPending: boolean;
  isError: boolean;
  error: Error | null;
  isFetching: boolean;
  refetch: () => unknown;
};

type Props<T> = {
  caption: string;
  columns: ColumnDef<T, unknown>[];
  state: TListState;
  onStateChange: (next: TListState) => void;
  query: TQueryLike<T>;
  searchLabel: string;
  empty: ReactNode;
  /** Extra filters (selects) shown in the toolbar. */
  filters?: ReactNode;
  /** Columns hidden until the user shows them. */
  initiallyHidden?: string[];
  /**
   * Filters the page fixes (the customer a customer page shows): never the user's filters, so
   * an empty list then says what is missing instead of "nothing matches these filters".
   */
  scopeKeys?: string[];
  getRowId: (row: T) => string;
};

const PAGE_SIZES = [10, 25, 50, 100];

/**
 * A table whose paging, sorting and filtering happen on the server (TanStack Table in manual
 * mode): sort by header buttons, text filter, page controls, column visibility, empty and error states.
 */
export function ServerDataTable<T>({
  caption,
  columns,
  state,
  onStateChange,
  query,
  searchLabel,
  empty,
  filters,
  initiallyHidden = [],
  scopeKeys = [],
  getRowId,
}: Props<T>) {
  const search = useSearchBox(state.q, (q) => onStateChange({ ...state, q, page: 1 }));
  const [visibility, setVisibility] = useState<VisibilityState>(
    Object.fromEntries(initiallyHidden.map((c) => [c, false])),
  );
  const searchId = useId();

  const sorting: SortingState = [{ id: state.sort, desc: state.dir === "desc" }];
  const page = query.data;
  // TanStack Table returns fresh functions each render; the compiler skips memoizing here on purpose.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: page?.items ?? [],
    columns,
    getRowId,
    state: { sorting, columnVisibility: visibility },
    onColumnVisibilityChange: setVisibility,
    manualPagination: true,
    manualSorting: true,
    manualFiltering: true,
    pageCount: page?.pageCount ?? -1,
    getCoreRowModel: getCoreRowModel(),
  });

  const toggleSort = (id: string) => {
    const dir = state.sort === id && state.dir === "asc" ? "desc" : "asc";
    onStateChange({ ...state, sort: id, dir, page: 1 });
  };

  const isEmpty = !!page && page.total === 0;
  const scope = Object.fromEntries(
    Object.entries(state.filters).filter(([k]) => scopeKeys.includes(k)),
  );
  const filtered =
    !!state.q ||
    Object.entries(state.filters).some(([k, v]) => !scopeKeys.includes(k) && Boolean(v));

  return (
    <div aria-busy={query.isFetching || undefined} onClickCapture={search.onClickCapture}>
      <DataTableShell
        caption={caption}
        toolbar={
          <>
            <div className="flex min-w-56 flex-1 flex-col gap-1">
              <label htmlFor={searchId} className="text-sm font-medium text-ink-800">
                {searchLabel}
              </label>
              <Input
                id={searchId}
                type="search"
                value={search.text}
                onChange={(e) => search.setText(e.target.value)}
                placeholder="Type to filter"
              />
            </div>
            {filters}
            <details className="relative">
              <summary className="flex h-11 cursor-pointer list-none items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-800 hover:bg-ink-100">
                Columns
              </summary>
              <fieldset className="absolute right-0 z-20 mt-1 flex w-56 flex-col gap-1 rounded-md border border-ink-200 bg-white p-3 shadow-lg">
                <legend className="sr-only">Show or hide columns</legend>
                {table
                  .getAllLeafColumns()
                  .filter((c) => c.getCanHide())
                  .map((c) => (
                    <label key={c.id} className="flex items-center gap-2 text-sm text-ink-800">
                      <input
                        type="checkbox"
                        checked={c.getIsVisible()}
                        onChange={c.getToggleVisibilityHandler()}
                        className="size-4"
                      />
                      {typeof c.columnDef.header === "string" ? c.columnDef.header : c.id}
                    </label>
                  ))}
              </fieldset>
            </details>
          </>
        }
        isEmpty={isEmpty || query.isError}
        empty={
          query.isError ? (
            <div
              role="alert"
              className="rounded-lg border border-danger-600 bg-danger-50 p-4 text-sm text-danger-700"
            >
              <p className="font-medium">The list could not be loaded.</p>
              <p>{query.error?.message}</p>
              <Button
                variant="secondary"
                size="sm"
                className="mt-2"
                onClick={() => query.refetch()}
              >
                Try again
              </Button>
            </div>
          ) : filtered ? (
            <p className="rounded-lg border border-dashed border-ink-300 bg-white p-6 text-center text-ink-700">
              Nothing matches these filters.{" "}
              <button
                type="button"
                className="font-medium text-furrow-700 underline"
                onClick={() => {
                  search.setText("");
                  onStateChange({ ...state, q: "", filters: scope, page: 1 });
                }}
              >
                Clear filters
              </button>
            </p>
          ) : (
            empty
          )
        }
        head={table.getHeaderGroups().map((hg) => (
          <tr key={hg.id}>
            {hg.headers.map((h) => {
              const sortable = h.column.columnDef.enableSorting !== false;
              const active = state.sort === h.column.id;
              const label = flexRender(h.column.columnDef.header, h.getContext());
              return (
                <th
                  key={h.id}
                  scope="col"
                  className="px-3 py-2 align-bottom"
                  aria-sort={
                    active ? (state.dir === "asc" ? "ascending" : "descending") : undefined
                  }
                >
                  {sortable ? (
                    <button
                      type="button"
                      onClick={() => toggleSort(h.column.id)}
                      className="inline-flex items-center gap-1 rounded uppercase hover:text-furrow-700"
                    >
                      {label}
                      <span aria-hidden>{active ? (state.dir === "asc" ? "▲" : "▼") : "↕"}</span>
                    </button>
                  ) : (
                    label
                  )}
                </th>
              );
            })}
          </tr>
        ))}
        body={
          query.isPending ? (
            <tr>
              <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-600">
                Loading…
              </td>
            </tr>
          ) : (
            table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="hover:bg-furrow-50">
                {row.getVisibleCells().map((cell) => (
                  // Cells wrap so the table fits its card on a laptop screen; phones scroll the box.
                  <td key={cell.id} className="px-3 py-2 align-top text-ink-800">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))
          )
        }
        footer={
          page ? (
            <>
              <p aria-live="polite">
                {page.total === 0
                  ? "No rows"
                  : `Rows ${(page.page - 1) * page.pageSize + 1}–${Math.min(page.page * page.pageSize, page.total)} of ${page.total}`}
              </p>
              <div className="flex flex-wrap items-center gap-2">
                <label className="flex items-center gap-2">
                  <span className="whitespace-nowrap">Rows per page</span>
                  <Select
                    className="h-9 w-20"
                    value={state.pageSize}
                    onChange={(e) =>
                      onStateChange({ ...state, pageSize: Number(e.target.value), page: 1 })
                    }
                  >
                    {PAGE_SIZES.map((n) => (
                      <option key={n} value={n}>
                        {n}
                      </option>
                    ))}
                  </Select>
                </label>
                <PageButtons
                  page={state.page}
                  pageCount={page.pageCount}
                  onPage={(n) => onStateChange({ ...state, page: n })}
                >
                  <span>
                    Page {page.page} of {page.pageCount}
                  </span>
                </PageButtons>
              </div>
            </>
          ) : null
        }
      />
    </div>
  );
}
