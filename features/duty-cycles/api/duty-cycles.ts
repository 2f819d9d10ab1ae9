import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from "@tanstack/react-query";
import type {
  TCreateDutyCycleInput,
  TDutyCycleDetail,
  TDutyCycleRow,
  TPage,
  TUpdateDutyCycleInput,
} from "@/features/duty-cycles/schemas/duty-cycle";
import { apiFetch } from "@/lib/query/api-fetch";

export type TDutyCycleListState = {
  page: number;
  pageSize: number;
  sort: "createdAt" | "name" | "status" | "operatingHours";
  dir: "asc" | "desc";
  q: string;
  status: "" | "pending" | "processing" | "ready" | "failed";
  source: "" | "telematics" | "schedule" | "builder";
};

export const DEFAULT_DUTY_CYCLE_LIST: TDutyCycleListState = {
  page: 1,
  pageSize: 25,
  sort: "createdAt",
  dir: "desc",
  q: "",
  status: "",
  source: "",
};

export const dutyCycleKeys = {
  all: ["duty-cycles"] as const,
  lists: () => [...dutyCycleKeys.all, "list"] as const,
  list: (state: TDutyCycleListState) => [...dutyCycleKeys.lists(), state] as const,
  details: () => [...dutyCycleKeys.all, "detail"] as const,
  detail: (id: string) => [...dutyCycleKeys.details(), id] as const,
};

/** The list state as query parameters, empty filters left out. */
export function listQueryOf(state: TDutyCycleListState): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(state)) if (v !== "" && v !== undefined) out[k] = String(v);
  return out;
}

export const dutyCycleListPath = (state: TDutyCycleListState) =>
  `/api/v1/duty-cycles?${new URLSearchParams(listQueryOf(state))}`;

export const dutyCycleListOptions = (state: TDutyCycleListState) =>
  queryOptions({
    queryKey: dutyCycleKeys.list(state),
    queryFn: () => apiFetch<TPage<TDutyCycleRow>>(dutyCycleListPath(state)),
    placeholderData: keepPreviousData,
  });

const working = (status: string | undefined) => status === "pending" || status === "processing";

export const dutyCycleOptions = (id: string) =>
  queryOptions({
    queryKey: dutyCycleKeys.detail(id),
    queryFn: () => apiFetch<TDutyCycleDetail>(`/api/v1/duty-cycles/${id}`),
    // Poll while the worker is at it, so progress shows live; stop once it is done.
    refetchInterval: (q) => (working(q.state.data?.status) ? 1000 : false),
  });

export const useDutyCycles = (state: TDutyCycleListState) => useQuery(dutyCycleListOptions(state));
export const useDutyCycle = (id: string) => useQuery(dutyCycleOptions(id));

export function useCreateDutyCycle() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TCreateDutyCycleInput) =>
      apiFetch<TDutyCycleRow>("/api/v1/duty-cycles", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: dutyCycleKeys.lists() }),
  });
}

/** Renames, reassigns or (builder cycles) rebuilds a duty cycle from the version it was opened at. */
export function useUpdateDutyCycle(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TUpdateDutyCycleInput) =>
      apiFetch<TDutyCycleRow>(`/api/v1/duty-cycles/${id}`, { method: "PATCH", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: dutyCycleKeys.all }),
  });
}

export function useRetryDutyCycleImport(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiFetch<TDutyCycleRow>(`/api/v1/duty-cycles/${id}/retry`, { method: "POST" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: dutyCycleKeys.all }),
  });
}

export function useDeleteDutyCycle() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ deleted: true }>(`/api/v1/duty-cycles/${id}?confirm=true`, { method: "DELETE" }),
    onSuccess: (_r, id) => {
      qc.removeQueries({ queryKey: dutyCycleKeys.detail(id) });
      return qc.invalidateQueries({ queryKey: dutyCycleKeys.lists() });
    },
  });
}
