"use client";

import Link from "next/link";
import type { ReactNode } from "react";
import { Card } from "@/lib/ui/card";
import { useCustomer, useDeleteCustomer } from "@/features/customers/api/customers";
import { CustomerForm } from "@/features/customers/components/customer-form";
import { SitesPanel } from "@/features/customers/components/sites-panel";
import { DeleteButton } from "@/lib/ui/delete-button";

/**
 * One customer: details (editable by staff) and sites; `children` (the page's machines and
 * estimates, from the features above this one) follow below.
 */
export function CustomerDetail({
  id,
  canWrite,
  children,
}: {
  id: string;
  canWrite: boolean;
  children?: ReactNode;
}) {
  const customer = useCustomer(id);
  const remove = useDeleteCustomer();
  if (customer.isPending) return <p className="text-ink-600">Loading customer…</p>;
  if (customer.isError)
    return (
      <p role="alert" className="text-danger-700">
        This customer could not be loaded: {customer.error.message}
      </p>
    );
  const c = customer.data;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-ink-900">{c.name}</h1>
          <p className="text-ink-700">
            {c.kind}
            {c.contactName ? ` · ${c.contactName}` : ""}
            {c.contactPhone ? ` · ${c.contactPhone}` : ""}
          </p>
        </div>
        {canWrite ? (
          <div className="flex flex-wrap gap-2">
            <Link
              href={`/machines/new?customerId=${c.id}`}
              className="inline-flex h-9 items-center rounded-md bg-furrow-600 px-3 text-sm font-medium text-white hover:bg-furrow-700"
            >
              Add a machine
            </Link>
            <Link
              href={`/estimates/new?customerId=${c.id}`}
              className="inline-flex h-9 items-center rounded-md border border-ink-300 bg-white px-3 text-sm font-medium text-ink-800 hover:bg-ink-100"
            >
              Run an estimate
            </Link>
            <DeleteButton
              what={c.name}
              consequences="Its sites, machines, duty cycles and estimates are deleted with it. This cannot be undone."
              onDelete={() => remove.mutateAsync(c.id)}
              redirectTo="/customers"
            />
          </div>
        ) : null}
      </header>
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="Details">
          {canWrite ? (
            <CustomerForm customer={c} />
          ) : (
            <dl className="grid gap-2 text-sm">
              <div>
                <dt className="text-ink-600">Contact</dt>
                <dd>
                  {[c.contactName, c.contactEmail, c.contactPhone].filter(Boolean).join(" · ") ||
                    "—"}
                </dd>
              </div>
              {c.contacts.map((k, i) => (
                <div key={i}>
                  <dt className="text-ink-600">{k.role ?? "Contact"}</dt>
                  <dd>{[k.name, k.email, k.phone].filter(Boolean).join(" · ")}</dd>
                </div>
              ))}
              <div>
                <dt className="text-ink-600">Notes</dt>
                <dd className="whitespace-pre-wrap">{c.notes || "—"}</dd>
              </div>
            </dl>
          )}
        </Card>
        <Card title="Sites and ground">
          <SitesPanel customerId={c.id} canWrite={canWrite} />
        </Card>
      </div>
      {children}
    </div>
  );
}
