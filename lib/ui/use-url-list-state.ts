"use client";

import { useCallback, useMemo } from "react";
import type { TListState } from "@/lib/query/list-state";
import { useUrlState } from "@/lib/ui/use-url-state";

/**
 * A server data table's state in the URL: page, page size, sort, direction, search text and the
 * user's filters (`filterKeys`). `scope` filters (the customer a page shows) are fixed by the
 * page, not the URL, and never count as the user's filters.
 */
export function useUrlListState(
  defaults: TListState,
  {
    prefix = "",
    filterKeys = [],
    scope = {},
  }: { prefix?: string; filterKeys?: readonly string[]; scope?: Record<string, string> } = {},
): [TListState, (next: TListState) => void] {
  const flatDefaults = {
    page: defaults.page,
    pageSize: defaults.pageSize,
    sort: defaults.sort,
    dir: defaults.dir,
    q: defaults.q,
  };
  const [flat, setFlat] = useUrlState(flatDefaults, { prefix, extraKeys: filterKeys });
  const scopeKey = JSON.stringify(scope);
  const filterKeysKey = filterKeys.join(",");
  const state = useMemo<TListState>(() => {
    const filters: Record<string, string> = { ...(JSON.parse(scopeKey) as Record<string, string>) };
    for (const key of filterKeysKey.split(",")) if (key && flat[key]) filters[key] = flat[key];
    return {
      page: Number(flat.page),
      pageSize: Number(flat.pageSize),
      sort: String(flat.sort),
      dir: flat.dir === "desc" ? "desc" : "asc",
      q: String(flat.q),
      filters,
    };
  }, [flat, scopeKey, filterKeysKey]);
  const setState = useCallback(
    (next: TListState) => {
      const userFilters: Record<string, string> = {};
      for (const key of filterKeysKey.split(","))
        if (key) userFilters[key] = next.filters[key] ?? "";
      setFlat({
        page: next.page,
        pageSize: next.pageSize,
        sort: next.sort,
        dir: next.dir,
        q: next.q,
        ...userFilters,
      });
    },
    [setFlat, filterKeysKey],
  );
  return [state, setState];
}
