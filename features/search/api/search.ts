import { queryOptions, useQuery } from "@tanstack/react-query";
import type { TSearchResult } from "@/features/search/schemas/search";
import { apiFetch } from "@/lib/query/api-fetch";

export const searchKeys = {
  all: ["search"] as const,
  text: (q: string) => [...searchKeys.all, q] as const,
};

export const searchOptions = (q: string) =>
  queryOptions({
    queryKey: searchKeys.text(q),
    queryFn: () => apiFetch<TSearchResult>(`/api/v1/search?q=${encodeURIComponent(q)}`),
    enabled: q.trim().length >= 2,
    staleTime: 10_000,
  });

export const useSearch = (q: string) => useQuery(searchOptions(q.trim()));
