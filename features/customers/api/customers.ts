import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  keepPreviousData,
} from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";
import type {
  TCustomerDto,
  TCustomerInput,
  TCustomerPatch,
  TCustomerRow,
} from "@/features/customers/schemas/customer";
import { apiFetch, toQueryString } from "@/lib/query/api-fetch";
import { listParams, listState, type TListState } from "@/lib/query/list-state";

export const customerKeys = {
  all: ["customers"] as const,
  lists: () => [...customerKeys.all, "list"] as const,
  list: (state: TListState) => [...customerKeys.lists(), state] as const,
  details: () => [...customerKeys.all, "detail"] as const,
  detail: (id: string) => [...customerKeys.details(), id] as const,
};

export const customerListOptions = (state: TListState) =>
  queryOptions({
    queryKey: customerKeys.list(state),
    queryFn: () =>
      apiFetch<TPage<TCustomerRow>>(`/api/v1/customers${toQueryString(listParams(state))}`),
    placeholderData: keepPreviousData,
  });

export const customerOptions = (id: string) =>
  queryOptions({
    queryKey: customerKeys.detail(id),
    queryFn: () => apiFetch<TCustomerDto>(`/api/v1/customers/${id}`),
  });

export const useCustomers = (state: TListState) => useQuery(customerListOptions(state));
export const useCustomer = (id: string) => useQuery(customerOptions(id));

export function useCreateCustomer() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TCustomerInput) =>
      apiFetch<TCustomerDto>("/api/v1/customers", { method: "POST", body: input }),
    onSuccess: (created) => {
      qc.setQueryData(customerKeys.detail(created.id), created);
      return qc.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}

/** Shows the change at once and rolls back if the server refuses it. */
export function useUpdateCustomer(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: TCustomerPatch) =>
      apiFetch<TCustomerDto>(`/api/v1/customers/${id}`, { method: "PATCH", body: patch }),
    onMutate: async (patch) => {
      await qc.cancelQueries({ queryKey: customerKeys.detail(id) });
      const previous = qc.getQueryData<TCustomerDto>(customerKeys.detail(id));
      if (previous)
        qc.setQueryData(customerKeys.detail(id), { ...previous, ...patch } as TCustomerDto);
      return { previous };
    },
    onError: (_e, _patch, ctx) => {
      if (ctx?.previous) qc.setQueryData(customerKeys.detail(id), ctx.previous);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: customerKeys.all }),
  });
}

export function useDeleteCustomer() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ deleted: true }>(`/api/v1/customers/${id}?confirm=true`, { method: "DELETE" }),
    onSuccess: (_r, id) => {
      qc.removeQueries({ queryKey: customerKeys.detail(id) });
      return qc.invalidateQueries();
    },
  });
}

/** First-paint list state, shared by the server prefetch and the client table. */
export const DEFAULT_CUSTOMER_LIST = listState({ sort: "name" });
