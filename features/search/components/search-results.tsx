"use client";

import Link from "next/link";
import { useSearch } from "@/features/search/api/search";
import type { TSearchHit } from "@/features/search/schemas/search";
import { Card } from "@/lib/ui/card";

function Hits({ hits, none }: { hits: TSearchHit[]; none: string }) {
  if (hits.length === 0) return <p className="text-sm text-ink-600">{none}</p>;
  return (
    <ul className="divide-y divide-ink-100">
      {hits.map((h) => (
        <li key={h.id} className="py-2">
          <Link href={h.href} className="font-medium text-furrow-700 hover:underline">
            {h.title}
          </Link>
          <p className="text-sm text-ink-600">{h.subtitle}</p>
        </li>
      ))}
    </ul>
  );
}

export function SearchResults({ q }: { q: string }) {
  const search = useSearch(q);
  if (q.trim().length < 2)
    return <p className="text-ink-700">Type at least 2 characters to search.</p>;
  if (search.isPending) return <p className="text-ink-600">Searching…</p>;
  if (search.isError)
    return (
      <p role="alert" className="text-danger-700">
        Search failed: {search.error.message}
      </p>
    );
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <Card title="Customers">
        <Hits hits={search.data.customers} none="No customers match." />
      </Card>
      <Card title="Machines">
        <Hits hits={search.data.machines} none="No machines match." />
      </Card>
    </div>
  );
}
