import type { QueryClient, QueryKey } from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";

/**
 * Takes a row out of every cached page under `listsKey` at once (optimistic delete) and returns
 * what was there, so `restoreLists` can put it back if the server refuses.
 */
export async function removeFromLists(qc: QueryClient, listsKey: QueryKey, id: string) {
  await qc.cancelQueries({ queryKey: listsKey });
  const previous = qc.getQueriesData<TPage<{ id: string }>>({ queryKey: listsKey });
  for (const [key, page] of previous)
    if (page)
      qc.setQueryData(key, {
        ...page,
        items: page.items.filter((row) => row.id !== id),
        total: page.total - 1,
      });
  return { previous };
}

export function restoreLists(
  qc: QueryClient,
  ctx: { previous: [QueryKey, unknown][] } | undefined,
) {
  for (const [key, page] of ctx?.previous ?? []) qc.setQueryData(key, page);
}
