import { DataTableShell } from "@/lib/ui/data-table-shell";
import { formatMoney } from "@/lib/billing/money";
import { formatDate } from "@/lib/format/format";
import type { TInvoiceRow } from "@/features/billing/server/get-billing-overview";

export function InvoiceTable({ invoices }: { invoices: TInvoiceRow[] }) {
  return (
    <DataTableShell
      caption="Invoices"
      isEmpty={invoices.length === 0}
      empty={<p className="text-sm text-ink-600">No invoices yet.</p>}
      head={
        <tr>
          <th className="px-3 py-2 text-left">Invoice</th>
          <th className="px-3 py-2 text-left">Date</th>
          <th className="px-3 py-2 text-right">Amount</th>
          <th className="px-3 py-2 text-left">Status</th>
          <th className="px-3 py-2 text-left">PDF</th>
        </tr>
      }
      body={invoices.map((i) => (
        <tr key={i.id} className="border-t border-ink-100">
          <td className="px-3 py-2">{i.number}</td>
          <td className="px-3 py-2">{formatDate(i.createdAt)}</td>
          <td className="px-3 py-2 text-right">{formatMoney(i.amountMinor, i.currency)}</td>
          <td className="px-3 py-2">
            {i.status === "paid" ? "Paid" : i.status === "open" ? "Unpaid" : i.status}
          </td>
          <td className="px-3 py-2">
            {i.pdfUrl ? (
              <a
                className="text-furrow-700 underline"
                href={i.pdfUrl}
                target="_blank"
                rel="noreferrer"
              >
                Download
              </a>
            ) : null}
          </td>
        </tr>
      ))}
    />
  );
}
