import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { TPage } from "@/lib/query/list-query";
import type { TSiteDto, TSiteInput, TSitePatch } from "@/features/customers/schemas/site";
import { apiFetch } from "@/lib/query/api-fetch";

export const siteKeys = {
  all: ["sites"] as const,
  byCustomer: (customerId: string) => [...siteKeys.all, "customer", customerId] as const,
};

export const customerSitesOptions = (customerId: string) =>
  queryOptions({
    queryKey: siteKeys.byCustomer(customerId),
    queryFn: () => apiFetch<TPage<TSiteDto>>(`/api/v1/sites?customerId=${customerId}&pageSize=100`),
  });

export const useCustomerSites = (customerId: string | null) =>
  useQuery({ ...customerSitesOptions(customerId ?? ""), enabled: !!customerId });

export function useCreateSite(customerId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Omit<TSiteInput, "customerId">) =>
      apiFetch<TSiteDto>("/api/v1/sites", { method: "POST", body: { ...input, customerId } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: siteKeys.byCustomer(customerId) }),
  });
}

export function useUpdateSite(customerId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: TSitePatch }) =>
      apiFetch<TSiteDto>(`/api/v1/sites/${id}`, { method: "PATCH", body: patch }),
    onSettled: () => qc.invalidateQueries({ queryKey: siteKeys.byCustomer(customerId) }),
  });
}

/** Removes the site from the list at once; puts it back if the server refuses. */
export function useDeleteSite(customerId: string) {
  const qc = useQueryClient();
  const key = siteKeys.byCustomer(customerId);
  return useMutation({
    mutationFn: (id: string) => apiFetch(`/api/v1/sites/${id}?confirm=true`, { method: "DELETE" }),
    onMutate: async (id) => {
      await qc.cancelQueries({ queryKey: key });
      const previous = qc.getQueryData<TPage<TSiteDto>>(key);
      if (previous)
        qc.setQueryData(key, {
          ...previous,
          items: previous.items.filter((s) => s.id !== id),
          total: previous.total - 1,
        });
      return { previous };
    },
    onError: (_e, _id, ctx) => {
      if (ctx?.previous) qc.setQueryData(key, ctx.previous);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: key }),
  });
}
