"use client";

import Link from "next/link";
import { formatDate } from "@/lib/format/format";
import { useSearchBox } from "@/lib/ui/use-search-box";
import { useUrlState } from "@/lib/ui/use-url-state";
import { DataTableShell } from "@/lib/ui/data-table-shell";
import { EmptyState } from "@/lib/ui/empty-state";
import { Input, Select } from "@/lib/ui/input";
import { PageButtons } from "@/lib/ui/pager";
import {
  DEFAULT_DUTY_CYCLE_LIST,
  useDutyCycles,
  type TDutyCycleListState,
} from "@/features/duty-cycles/api/duty-cycles";

const STATUS_STYLE = {
  pending: "bg-ink-100 text-ink-800",
  processing: "bg-furrow-50 text-furrow-800",
  ready: "bg-ok-50 text-ok-700",
  failed: "bg-danger-50 text-danger-700",
} as const;

const SOURCE = { telematics: "Log", schedule: "Schedule", builder: "Builder" } as const;

type TSort = TDutyCycleListState["sort"];

/**
 * The dealership's duty cycles with paging, sorting and filters kept on the server and in the
 * URL (back and forward step through them; a copied link opens the same view).
 */
export function DutyCyclesTable({ canWrite }: { canWrite: boolean }) {
  const [urlState, setUrlState] = useUrlState(DEFAULT_DUTY_CYCLE_LIST);
  const state = urlState as TDutyCycleListState;
  const { data, isFetching, error } = useDutyCycles(state);
  const set = (patch: Partial<TDutyCycleListState>) => setUrlState({ ...state, page: 1, ...patch });
  // The search box updates the URL once typing pauses, not on every key.
  const search = useSearchBox(state.q, (q) => set({ q }));
  const filtered = !!(state.q || state.status || state.source);
  const sortBy = (sort: TSort) =>
    set({ sort, dir: state.sort === sort && state.dir === "asc" ? "desc" : "asc" });
  const arrow = (sort: TSort) => (state.sort === sort ? (state.dir === "asc" ? " ▲" : " ▼") : "");
  const header = (sort: TSort, label: string) => (
    <th
      scope="col"
      className="px-3 py-2"
      aria-sort={state.sort === sort ? (state.dir === "asc" ? "ascending" : "descending") : "none"}
    >
      <button type="button" className="font-medium uppercase" onClick={() => sortBy(sort)}>
        {label}
        {arrow(sort)}
      </button>
    </th>
  );
  return (
    <div onClickCapture={search.onClickCapture}>
      <DataTableShell
        caption="Duty cycles"
        toolbar={
          <>
            <div className="w-56">
              <Input
                aria-label="Search by name"
                placeholder="Search by name"
                value={search.text}
                onChange={(e) => search.setText(e.target.value)}
              />
            </div>
            <Select
              aria-label="Status"
              className="w-40"
              value={state.status}
              onChange={(e) => set({ status: e.target.value as TDutyCycleListState["status"] })}
            >
              <option value="">Any status</option>
              <option value="ready">Ready</option>
              <option value="processing">Processing</option>
              <option value="pending">Waiting</option>
              <option value="failed">Failed</option>
            </Select>
            <Select
              aria-label="Source"
              className="w-44"
              value={state.source}
              onChange={(e) => set({ source: e.target.value as TDutyCycleListState["source"] })}
            >
              <option value="">Any source</option>
              <option value="telematics">Telematics log</option>
              <option value="schedule">Turn schedule</option>
              <option value="builder">Builder</option>
            </Select>
            {isFetching ? <span className="text-sm text-ink-600">Loading…</span> : null}
            {error ? (
              <span role="alert" className="text-sm text-danger-700">
                {error.message}
              </span>
            ) : null}
          </>
        }
        isEmpty={data?.items.length === 0}
        empty={
          filtered ? (
            <p className="rounded-lg border border-dashed border-ink-300 bg-white p-6 text-center text-ink-700">
              Nothing matches these filters.{" "}
              <button
                type="button"
                className="font-medium text-furrow-700 underline"
                onClick={() => {
                  search.setText("");
                  set({ q: "", status: "", source: "" });
                }}
              >
                Clear filters
              </button>
            </p>
          ) : (
            <EmptyState
              title="No duty cycles yet"
              action={
                canWrite ? (
                  <span className="flex flex-wrap justify-center gap-3">
                    <Link
                      href="/duty-cycles/upload"
                      className="font-medium text-furrow-700 underline"
                    >
                      Upload a log or schedule
                    </Link>
                    <Link
                      href="/duty-cycles/build"
                      className="font-medium text-furrow-700 underline"
                    >
                      Build one without a file
                    </Link>
                  </span>
                ) : undefined
              }
            >
              Upload a telematics log or a turn schedule, or build one from the work the machine
              does.
            </EmptyState>
          )
        }
        head={
          <tr>
            {header("name", "Name")}
            <th scope="col" className="px-3 py-2">
              Customer
            </th>
            <th scope="col" className="px-3 py-2">
              Source
            </th>
            {header("status", "Status")}
            {header("operatingHours", "Hours")}
            <th scope="col" className="px-3 py-2">
              Turns/h
            </th>
            {header("createdAt", "Added")}
          </tr>
        }
        body={data?.items.map((c) => (
          <tr key={c.id} className="hover:bg-ink-50">
            <td className="px-3 py-2">
              <Link
                href={`/duty-cycles/${c.id}`}
                className="font-medium text-furrow-700 hover:underline"
              >
                {c.name}
              </Link>
            </td>
            <td className="px-3 py-2">{c.customerName}</td>
            <td className="px-3 py-2">{SOURCE[c.source]}</td>
            <td className="px-3 py-2">
              <span className={`rounded px-2 py-0.5 text-xs font-medium ${STATUS_STYLE[c.status]}`}>
                {c.status === "processing"
                  ? `processing ${Math.round(c.progress * 100)} %`
                  : c.status}
              </span>
            </td>
            <td className="px-3 py-2">
              {c.operatingHours === null ? "—" : c.operatingHours.toFixed(1)}
            </td>
            <td className="px-3 py-2">
              {c.turnsPerHour === null ? "—" : c.turnsPerHour.toFixed(1)}
            </td>
            <td className="px-3 py-2">{formatDate(c.createdAt)}</td>
          </tr>
        ))}
        footer={
          data ? (
            <>
              <span>
                {data.total} duty cycle{data.total === 1 ? "" : "s"} · page {data.page} of{" "}
                {data.pageCount}
              </span>
              <span className="flex gap-2">
                <PageButtons
                  page={state.page}
                  pageCount={data.pageCount}
                  onPage={(n) => setUrlState({ ...state, page: n })}
                />
              </span>
            </>
          ) : null
        }
      />
    </div>
  );
}
