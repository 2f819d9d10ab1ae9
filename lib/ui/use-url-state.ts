"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useMemo } from "react";

type TFlat = Record<string, string | number>;

/**
 * Reads a flat state (`{ page: 1, sort: "name", q: "" }`) from the query string over its
 * defaults; numbers stay numbers. `extraKeys` are optional text keys with no default (filters).
 */
export function readUrlState<T extends TFlat>(
  params: URLSearchParams,
  defaults: T,
  prefix = "",
  extraKeys: readonly string[] = [],
): T & Record<string, string> {
  const out: Record<string, string | number> = { ...defaults };
  for (const key of [...Object.keys(defaults), ...extraKeys]) {
    const raw = params.get(prefix + key);
    if (raw === null) continue;
    const fallback = defaults[key];
    if (typeof fallback === "number") {
      const n = Number(raw);
      if (Number.isInteger(n) && n > 0) out[key] = n;
    } else out[key] = raw;
  }
  return out as T & Record<string, string>;
}

/** The query string for a state: values equal to the default, and empty texts, left out. */
export function writeUrlState(
  params: URLSearchParams,
  state: TFlat,
  defaults: TFlat,
  prefix = "",
  extraKeys: readonly string[] = [],
): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const key of new Set([...Object.keys(defaults), ...extraKeys, ...Object.keys(state)])) {
    const value = state[key];
    if (value === undefined || value === "" || value === defaults[key]) next.delete(prefix + key);
    else next.set(prefix + key, String(value));
  }
  return next;
}

/**
 * A table's state (page, sort, filters) kept in the URL, so back and forward step through it and
 * a copied link opens the same view. Several tables on one page use different prefixes.
 */
export function useUrlState<T extends TFlat>(
  defaults: T,
  { prefix = "", extraKeys = [] }: { prefix?: string; extraKeys?: readonly string[] } = {},
): [T & Record<string, string>, (next: TFlat) => void] {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const search = params.toString();
  // Keyed on the serialised values so a new object only comes when the state really changes.
  const keyOfDefaults = JSON.stringify(defaults);
  const keyOfExtras = extraKeys.join(",");
  const state = useMemo(
    () => readUrlState(new URLSearchParams(search), defaults, prefix, extraKeys),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [search, keyOfDefaults, prefix, keyOfExtras],
  );
  const setState = useCallback(
    (next: TFlat) => {
      const query = writeUrlState(
        new URLSearchParams(window.location.search),
        next,
        defaults,
        prefix,
        extraKeys,
      ).toString();
      if (query === window.location.search.replace(/^\?/, "")) return;
      router.push(query ? `${pathname}?${query}` : pathname, { scroll: false });
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [router, pathname, keyOfDefaults, prefix, keyOfExtras],
  );
  return [state, setState];
}
