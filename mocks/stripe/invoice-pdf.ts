import { createElement as h } from "react";
import { Document, Page, Text, View, renderToBuffer } from "@react-pdf/renderer";
import type { TObj } from "@/mocks/stripe/store";

const money = (minor: number, currency: string) =>
  new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() }).format(
    minor / 100,
  );

/** A one-page PDF of a fake invoice, so invoice links in the app open a real document. */
export async function invoicePdf(invoice: TObj): Promise<Buffer> {
  const currency = String(invoice.currency);
  const lines = (invoice.lines as { data: { description: string; amount: number }[] }).data;
  const doc = h(
    Document,
    { title: `Invoice ${String(invoice.number)}` },
    h(
      Page,
      { size: "A4", style: { padding: 40, fontSize: 11 } },
      h(Text, { style: { fontSize: 18, marginBottom: 12 } }, `Invoice ${String(invoice.number)}`),
      h(
        Text,
        { style: { marginBottom: 12 } },
        "Issued by the local test payment service: no real charge.",
      ),
      ...lines.map((l, i) =>
        h(
          View,
          {
            key: i,
            style: { flexDirection: "row", justifyContent: "space-between", marginBottom: 4 },
          },
          h(Text, null, l.description),
          h(Text, null, money(l.amount, currency)),
        ),
      ),
      h(
        Text,
        { style: { marginTop: 12 } },
        `Total ${money(Number(invoice.total), currency)} (${String(invoice.status)})`,
      ),
    ),
  );
  return renderToBuffer(doc);
}
