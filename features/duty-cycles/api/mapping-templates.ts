import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { TColumnMapping, TFileKind } from "@/lib/duty-cycles/column-mapping";
import type { TMappingTemplate } from "@/features/duty-cycles/schemas/mapping-template";
import type { TPage } from "@/features/duty-cycles/schemas/duty-cycle";
import { apiFetch } from "@/lib/query/api-fetch";

export const mappingTemplateKeys = {
  all: ["mapping-templates"] as const,
  byKind: (kind: TFileKind) => [...mappingTemplateKeys.all, kind] as const,
};

export const mappingTemplateOptions = (kind: TFileKind) =>
  queryOptions({
    queryKey: mappingTemplateKeys.byKind(kind),
    queryFn: async () =>
      (
        await apiFetch<TPage<TMappingTemplate>>(
          `/api/v1/mapping-templates?kind=${kind}&pageSize=100`,
        )
      ).items,
  });

export const useMappingTemplates = (kind: TFileKind) => useQuery(mappingTemplateOptions(kind));

export function useSaveMappingTemplate() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; mapping: TColumnMapping }) =>
      apiFetch<TMappingTemplate>("/api/v1/mapping-templates", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: mappingTemplateKeys.all }),
  });
}

export function useDeleteMappingTemplate() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ deleted: true }>(`/api/v1/mapping-templates/${id}?confirm=true`, {
        method: "DELETE",
      }),
    onSuccess: () => qc.invalidateQueries({ queryKey: mappingTemplateKeys.all }),
  });
}
