import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";
import type {
  TEstimateCreate,
  TEstimateDto,
  TEstimateRow,
} from "@/features/estimates/schemas/estimate";
import { apiFetch, toQueryString } from "@/lib/query/api-fetch";
import { removeFromLists, restoreLists } from "@/lib/query/optimistic";
import { listParams, listState, type TListState } from "@/lib/query/list-state";

export const estimateKeys = {
  all: ["estimates"] as const,
  lists: () => [...estimateKeys.all, "list"] as const,
  list: (state: TListState) => [...estimateKeys.lists(), state] as const,
  detail: (id: string) => [...estimateKeys.all, "detail", id] as const,
};

export const estimateListOptions = (state: TListState) =>
  queryOptions({
    queryKey: estimateKeys.list(state),
    queryFn: () =>
      apiFetch<TPage<TEstimateRow>>(`/api/v1/estimates${toQueryString(listParams(state))}`),
    placeholderData: keepPreviousData,
  });

export const estimateOptions = (id: string) =>
  queryOptions({
    queryKey: estimateKeys.detail(id),
    queryFn: () => apiFetch<TEstimateDto>(`/api/v1/estimates/${id}`),
    // A stored estimate never changes.
    staleTime: Infinity,
  });

export const useEstimates = (state: TListState) => useQuery(estimateListOptions(state));
export const useEstimate = (id: string) => useQuery(estimateOptions(id));

export function useCreateEstimate() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TEstimateCreate) =>
      apiFetch<TEstimateDto>("/api/v1/estimates", { method: "POST", body: input }),
    onSuccess: (e) => {
      qc.setQueryData(estimateKeys.detail(e.id), e);
      return qc.invalidateQueries({ queryKey: estimateKeys.lists() });
    },
  });
}

export function useDeleteEstimate() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch(`/api/v1/estimates/${id}?confirm=true`, { method: "DELETE" }),
    onMutate: (id) => removeFromLists(qc, estimateKeys.lists(), id),
    onError: (_e, _id, ctx) => restoreLists(qc, ctx),
    onSettled: () => qc.invalidateQueries({ queryKey: estimateKeys.lists() }),
  });
}

/** First-paint list state, shared by the server prefetch and the client table. */
export const DEFAULT_ESTIMATE_LIST = listState({ sort: "createdAt", dir: "desc" });
