import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";
import type {
  TMachineDto,
  TMachineRecordInput,
  TMachineRecordPatch,
  TMachineRow,
} from "@/features/machines/schemas/machine";
import { apiFetch, toQueryString } from "@/lib/query/api-fetch";
import { removeFromLists, restoreLists } from "@/lib/query/optimistic";
import { listParams, listState, type TListState } from "@/lib/query/list-state";

export const machineKeys = {
  all: ["machines"] as const,
  lists: () => [...machineKeys.all, "list"] as const,
  list: (state: TListState) => [...machineKeys.lists(), state] as const,
  detail: (id: string) => [...machineKeys.all, "detail", id] as const,
};

export const machineListOptions = (state: TListState) =>
  queryOptions({
    queryKey: machineKeys.list(state),
    queryFn: () =>
      apiFetch<TPage<TMachineRow>>(`/api/v1/machines${toQueryString(listParams(state))}`),
    placeholderData: keepPreviousData,
  });

export const machineOptions = (id: string) =>
  queryOptions({
    queryKey: machineKeys.detail(id),
    queryFn: () => apiFetch<TMachineDto>(`/api/v1/machines/${id}`),
  });

export const useMachines = (state: TListState) => useQuery(machineListOptions(state));
export const useMachine = (id: string) => useQuery(machineOptions(id));

export function useCreateMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TMachineRecordInput) =>
      apiFetch<TMachineDto>("/api/v1/machines", { method: "POST", body: input }),
    onSuccess: (m) => {
      qc.setQueryData(machineKeys.detail(m.id), m);
      return qc.invalidateQueries({ queryKey: machineKeys.lists() });
    },
  });
}

export function useUpdateMachine(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: TMachineRecordPatch) =>
      apiFetch<TMachineDto>(`/api/v1/machines/${id}`, { method: "PATCH", body: patch }),
    onSuccess: (m) => {
      qc.setQueryData(machineKeys.detail(id), m);
      return qc.invalidateQueries({ queryKey: machineKeys.lists() });
    },
  });
}

export function useCopyMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, customerId, name }: { id: string; customerId: string; name?: string }) =>
      apiFetch<TMachineDto>(`/api/v1/machines/${id}/copy`, {
        method: "POST",
        body: { customerId, name },
      }),
    onSuccess: () => qc.invalidateQueries({ queryKey: machineKeys.lists() }),
  });
}

/** Takes the row out of every cached list at once; restores the lists if the server refuses. */
export function useDeleteMachine() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch(`/api/v1/machines/${id}?confirm=true`, { method: "DELETE" }),
    onMutate: (id) => removeFromLists(qc, machineKeys.lists(), id),
    onError: (_e, _id, ctx) => restoreLists(qc, ctx),
    onSettled: () => qc.invalidateQueries({ queryKey: machineKeys.all }),
  });
}

/** First-paint list state, shared by the server prefetch and the client table. */
export const DEFAULT_MACHINE_LIST = listState({ sort: "name" });
