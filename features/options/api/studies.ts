import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";
import { apiFetch, toQueryString } from "@/lib/query/api-fetch";
import { listState, type TListState } from "@/lib/query/list-state";
import type {
  TComparisonCreate,
  TComparisonDto,
  TStudyKind,
  TStudyRow,
  TSweepCreate,
  TSweepDto,
} from "@/features/options/schemas/study";

/** Route segment of each kind of study. */
const PATH: Record<TStudyKind, string> = { comparison: "comparisons", sweep: "sweeps" };

export const studyKeys = {
  all: (kind: TStudyKind) => ["studies", kind] as const,
  lists: (kind: TStudyKind) => [...studyKeys.all(kind), "list"] as const,
  list: (kind: TStudyKind, state: TListState) => [...studyKeys.lists(kind), state] as const,
  detail: (kind: TStudyKind, id: string) => [...studyKeys.all(kind), "detail", id] as const,
};

/** The list routes narrow by machine, customer or estimate and search titles; newest first. */
function studyListParams(state: TListState) {
  return { page: state.page, pageSize: state.pageSize, q: state.q, ...state.filters };
}

export const studyListOptions = (kind: TStudyKind, state: TListState) =>
  queryOptions({
    queryKey: studyKeys.list(kind, state),
    queryFn: () =>
      apiFetch<TPage<TStudyRow>>(`/api/v1/${PATH[kind]}${toQueryString(studyListParams(state))}`),
    placeholderData: keepPreviousData,
  });

export const comparisonOptions = (id: string) =>
  queryOptions({
    queryKey: studyKeys.detail("comparison", id),
    queryFn: () => apiFetch<TComparisonDto>(`/api/v1/comparisons/${id}`),
    // A stored version never changes; a rerun is a new id.
    staleTime: Infinity,
  });

export const sweepOptions = (id: string) =>
  queryOptions({
    queryKey: studyKeys.detail("sweep", id),
    queryFn: () => apiFetch<TSweepDto>(`/api/v1/sweeps/${id}`),
    staleTime: Infinity,
  });

export const useStudies = (kind: TStudyKind, state: TListState) =>
  useQuery(studyListOptions(kind, state));
export const useComparison = (id: string) => useQuery(comparisonOptions(id));
export const useSweep = (id: string) => useQuery(sweepOptions(id));

export function useCreateComparison() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TComparisonCreate) =>
      apiFetch<TComparisonDto>("/api/v1/comparisons", { method: "POST", body: input }),
    onSuccess: (c) => {
      qc.setQueryData(studyKeys.detail("comparison", c.id), c);
      return qc.invalidateQueries({ queryKey: studyKeys.lists("comparison") });
    },
  });
}

export function useCreateSweep() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TSweepCreate) =>
      apiFetch<TSweepDto>("/api/v1/sweeps", { method: "POST", body: input }),
    onSuccess: (s) => {
      qc.setQueryData(studyKeys.detail("sweep", s.id), s);
      return qc.invalidateQueries({ queryKey: studyKeys.lists("sweep") });
    },
  });
}

/** Reruns a stored study with today's engine; the answer is the new version. */
export function useRerunStudy<T extends TComparisonDto | TSweepDto>(kind: T["kind"]) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<T>(`/api/v1/${PATH[kind]}/${id}/rerun`, { method: "POST" }),
    onSuccess: (s) => {
      qc.setQueryData(studyKeys.detail(kind, s.id), s);
      return qc.invalidateQueries({ queryKey: studyKeys.lists(kind) });
    },
  });
}

/** Starts a quote report from a stored comparison (the reports route answers its id). */
export function usePrepareQuoteReport() {
  return useMutation({
    mutationFn: (comparisonId: string) =>
      apiFetch<{ id: string }>("/api/v1/reports", { method: "POST", body: { comparisonId } }),
  });
}

/** First-paint list state, shared by server prefetches and the tables. */
export const DEFAULT_STUDY_LIST = listState({ sort: "createdAt", dir: "desc", pageSize: 10 });
