"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { Card } from "@/lib/ui/card";
import { EmptyState } from "@/lib/ui/empty-state";
import { apiFetch } from "@/lib/query/api-fetch";
import { ReportsTable } from "@/features/reports/components/reports-table";

type TMachineItem = { id: string; name: string; kind: string; layout: string };

/**
 * A customer's home: their machines and the reports their dealer shared with them. Drafts,
 * raw estimates and duty cycles stay with the dealer.
 */
export function CustomerPortal({ customerName }: { customerName: string }) {
  const machines = useQuery({
    queryKey: ["portal", "machines"],
    queryFn: () => apiFetch<{ items: TMachineItem[] }>("/api/v1/machines?pageSize=100"),
  });
  return (
    <div className="flex flex-col gap-6">
      <header>
        <h1 className="text-2xl font-bold text-ink-900">{customerName}</h1>
        <p className="text-ink-700">
          Your machines and the tyre reports your dealer shared with you.
        </p>
      </header>
      <Card title="Reports shared with you">
        <ReportsTable asCustomer />
      </Card>
      <Card title="Your machines">
        {machines.data && machines.data.items.length === 0 ? (
          <EmptyState title="No machines on record">Your dealer adds your machines.</EmptyState>
        ) : (
          <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {machines.data?.items.map((m) => (
              <li key={m.id} className="rounded-md border border-ink-200 p-3">
                <Link
                  href={`/machines/${m.id}`}
                  className="font-medium text-furrow-700 hover:underline"
                >
                  {m.name}
                </Link>
                <p className="text-sm text-ink-600">{m.kind}</p>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
