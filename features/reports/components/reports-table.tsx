"use client";

import Link from "next/link";
import { PageButtons } from "@/lib/ui/pager";
import { ChoiceOptions } from "@/lib/ui/choice-options";
import { Field } from "@/lib/ui/field";
import { Input, Select } from "@/lib/ui/input";
import { EmptyState } from "@/lib/ui/empty-state";
import { useSearchBox } from "@/lib/ui/use-search-box";
import { useUrlState } from "@/lib/ui/use-url-state";
import { REPORT_STATUSES, STATUS_LABELS } from "@/lib/reports";
import {
  DEFAULT_REPORT_LIST,
  useReports,
  type TReportListState,
} from "@/features/reports/api/reports";

const day = (iso: string | null) =>
  iso
    ? new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })
    : "—";

/**
 * The dealership's reports (or a customer's shared ones): status, customer, search and paging,
 * kept in the URL so back, forward and a copied link give the same view.
 */
export function ReportsTable({
  asCustomer,
  customers = [],
}: {
  asCustomer: boolean;
  /** The customers a staff user may filter by; a customer account sees only its own. */
  customers?: { id: string; name: string }[];
}) {
  const [urlState, setUrlState] = useUrlState(DEFAULT_REPORT_LIST);
  const state = urlState as TReportListState;
  const setState = (next: TReportListState) => setUrlState(next);
  const search = useSearchBox(state.q, (q) => setState({ ...state, q, page: 1 }));
  const reports = useReports(state);
  const page = reports.data;
  return (
    <div className="flex flex-col gap-3" onClickCapture={search.onClickCapture}>
      <div className="flex flex-wrap items-end gap-2">
        <Field label="Search">
          <Input
            type="search"
            value={search.text}
            placeholder="Title, customer or machine"
            onChange={(e) => search.setText(e.target.value)}
          />
        </Field>
        {asCustomer || customers.length === 0 ? null : (
          <Field label="Customer">
            <Select
              value={state.customerId}
              onChange={(e) => setState({ ...state, customerId: e.target.value, page: 1 })}
            >
              <option value="">All customers</option>
              <ChoiceOptions choices={customers} />
            </Select>
          </Field>
        )}
        {asCustomer ? null : (
          <Field label="Status">
            <Select
              value={state.status}
              onChange={(e) => setState({ ...state, status: e.target.value, page: 1 })}
            >
              <option value="">Any status</option>
              {REPORT_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {STATUS_LABELS[s]}
                </option>
              ))}
            </Select>
          </Field>
        )}
      </div>
      {reports.isError ? (
        <p role="alert" className="text-danger-700">
          {reports.error.message}
        </p>
      ) : null}
      {page && page.items.length === 0 ? (
        <EmptyState title={asCustomer ? "No reports shared with you yet" : "No reports here"}>
          {asCustomer
            ? "Your dealer's reports appear here when they share one with you."
            : state.q || state.status || state.customerId
              ? "Nothing matches these filters."
              : "Open an estimate and choose “Prepare a quote report”."}
        </EmptyState>
      ) : null}
      {page && page.items.length > 0 ? (
        <div className="overflow-x-auto rounded-lg border border-ink-200 bg-white">
          <table className="min-w-full divide-y divide-ink-200 text-sm" data-testid="reports-table">
            <thead className="bg-ink-100 text-left text-xs font-medium uppercase tracking-wide text-ink-700">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Report
                </th>
                <th scope="col" className="px-3 py-2">
                  Customer
                </th>
                <th scope="col" className="px-3 py-2">
                  Machine
                </th>
                <th scope="col" className="px-3 py-2">
                  Version
                </th>
                <th scope="col" className="px-3 py-2">
                  Status
                </th>
                <th scope="col" className="px-3 py-2">
                  Issued
                </th>
                {asCustomer ? null : (
                  <th scope="col" className="px-3 py-2">
                    Last opened
                  </th>
                )}
              </tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {page.items.map((r) => (
                <tr key={`${r.reportId}:${r.version ?? "draft"}`}>
                  <td className="px-3 py-2">
                    <Link
                      href={
                        r.version
                          ? `/reports/${r.reportId}/v/${r.version}`
                          : `/reports/${r.reportId}`
                      }
                      className="font-medium text-furrow-700 hover:underline"
                    >
                      {r.title}
                    </Link>
                  </td>
                  <td className="px-3 py-2">{r.customerName}</td>
                  <td className="px-3 py-2">{r.machineName}</td>
                  <td className="px-3 py-2">{r.version ?? "—"}</td>
                  <td className="px-3 py-2">{STATUS_LABELS[r.status]}</td>
                  <td className="px-3 py-2">{day(r.issuedAt)}</td>
                  {asCustomer ? null : <td className="px-3 py-2">{day(r.lastOpenedAt)}</td>}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {page && page.pageCount > 1 ? (
        <nav aria-label="Pages" className="flex items-center gap-2 text-sm">
          <PageButtons
            page={state.page}
            pageCount={page.pageCount}
            onPage={(n) => setState({ ...state, page: n })}
          >
            <span>
              Page {page.page} of {page.pageCount} ({page.total} rows)
            </span>
          </PageButtons>
        </nav>
      ) : null}
    </div>
  );
}
