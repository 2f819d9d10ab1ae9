/** What a table asks of a list endpoint; fully populated so query keys match server prefetches. */
export type TListState = {
  page: number;
  pageSize: number;
  sort: string;
  dir: "asc" | "desc";
  q: string;
  filters: Record<string, string>;
};

export function listState(partial: Partial<TListState> & Pick<TListState, "sort">): TListState {
  return {
    page: partial.page ?? 1,
    pageSize: partial.pageSize ?? 25,
    sort: partial.sort,
    dir: partial.dir ?? "asc",
    q: partial.q ?? "",
    filters: partial.filters ?? {},
  };
}

export function listParams(state: TListState) {
  return {
    page: state.page,
    pageSize: state.pageSize,
    sort: state.sort,
    dir: state.dir,
    q: state.q,
    ...state.filters,
  };
}
