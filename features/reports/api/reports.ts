import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from "@tanstack/react-query";
import { apiFetch, toQueryString } from "@/lib/query/api-fetch";
import type { TPage } from "@/lib/query/list-query";
import type {
  TBrandingDto,
  TBrandingPatch,
  TReportDraftPatch,
  TReportDto,
  TReportMessageDto,
  TReportRow,
  TReportVersionDto,
} from "@/features/reports/schemas/report";

export type TReportListState = {
  page: number;
  pageSize: number;
  status: string;
  q: string;
  customerId: string;
};

export const DEFAULT_REPORT_LIST: TReportListState = {
  page: 1,
  pageSize: 25,
  status: "",
  q: "",
  customerId: "",
};

export const reportKeys = {
  all: ["reports"] as const,
  lists: () => [...reportKeys.all, "list"] as const,
  list: (state: TReportListState) => [...reportKeys.lists(), state] as const,
  detail: (id: string) => [...reportKeys.all, "detail", id] as const,
  version: (id: string, version: number | "latest") =>
    [...reportKeys.all, "version", id, version] as const,
  messages: (id: string) => [...reportKeys.all, "messages", id] as const,
  branding: () => ["branding"] as const,
};

export const reportListOptions = (state: TReportListState) =>
  queryOptions({
    queryKey: reportKeys.list(state),
    queryFn: () => apiFetch<TPage<TReportRow>>(`/api/v1/reports${toQueryString(state)}`),
    placeholderData: keepPreviousData,
  });

export const reportOptions = (id: string) =>
  queryOptions({
    queryKey: reportKeys.detail(id),
    queryFn: () => apiFetch<TReportDto>(`/api/v1/reports/${id}`),
  });

export const reportVersionOptions = (id: string, version: number | "latest") =>
  queryOptions({
    queryKey: reportKeys.version(id, version),
    queryFn: () => apiFetch<TReportVersionDto>(`/api/v1/reports/${id}/versions/${version}`),
    // An issued version never changes; "latest" may move on re-issue.
    staleTime: version === "latest" ? 0 : Infinity,
  });

export const reportMessagesOptions = (id: string) =>
  queryOptions({
    queryKey: reportKeys.messages(id),
    queryFn: () => apiFetch<TReportMessageDto[]>(`/api/v1/reports/${id}/messages`),
    refetchInterval: 30_000,
  });

export const brandingOptions = () =>
  queryOptions({
    queryKey: reportKeys.branding(),
    queryFn: () => apiFetch<TBrandingDto>("/api/v1/branding"),
  });

export const useReports = (state: TReportListState) => useQuery(reportListOptions(state));
export const useReport = (id: string) => useQuery(reportOptions(id));
export const useReportVersion = (id: string, version: number | "latest") =>
  useQuery(reportVersionOptions(id, version));
export const useReportMessages = (id: string) => useQuery(reportMessagesOptions(id));
export const useBranding = () => useQuery(brandingOptions());

function useReportMutation<TIn, TOut>(
  id: string,
  mutationFn: (input: TIn) => Promise<TOut>,
  also: (qc: ReturnType<typeof useQueryClient>) => unknown = () => undefined,
) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: reportKeys.detail(id) }),
        qc.invalidateQueries({ queryKey: reportKeys.lists() }),
        also(qc),
      ]),
  });
}

export function useCreateReport() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ({ estimateId: string } | { comparisonId: string }) & { title?: string }) =>
      apiFetch<TReportDto>("/api/v1/reports", { method: "POST", body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: reportKeys.lists() }),
  });
}

export const usePatchReport = (id: string) =>
  useReportMutation(id, (body: TReportDraftPatch) =>
    apiFetch<TReportDto>(`/api/v1/reports/${id}`, { method: "PATCH", body }),
  );

export const useIssueReport = (id: string) =>
  useReportMutation(
    id,
    () => apiFetch<TReportVersionDto>(`/api/v1/reports/${id}/issue`, { method: "POST" }),
    (qc) => qc.invalidateQueries({ queryKey: reportKeys.version(id, "latest") }),
  );

export const useShareReport = (id: string) =>
  useReportMutation(id, (body: { email?: string }) =>
    apiFetch<TReportDto & { message: string }>(`/api/v1/reports/${id}/shares`, {
      method: "POST",
      body,
    }),
  );

export const useWithdrawShare = (id: string) =>
  useReportMutation(id, () =>
    apiFetch<TReportDto>(`/api/v1/reports/${id}/shares`, { method: "DELETE" }),
  );

export function usePostMessage(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: { body: string }) =>
      apiFetch<TReportMessageDto>(`/api/v1/reports/${id}/messages`, { method: "POST", body }),
    onSuccess: () => qc.invalidateQueries({ queryKey: reportKeys.messages(id) }),
  });
}

export function useUpdateBranding() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: TBrandingPatch) =>
      apiFetch<TBrandingDto>("/api/v1/branding", { method: "PUT", body }),
    onSuccess: (b) => qc.setQueryData(reportKeys.branding(), b),
  });
}

export function useUploadLogo() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (file: File) => {
      const res = await fetch("/api/v1/branding/logo", {
        method: "POST",
        headers: { "content-type": "application/octet-stream" },
        body: file,
        credentials: "same-origin",
      });
      const data = (await res.json().catch(() => null)) as
        TBrandingDto | { error?: { message?: string } } | null;
      if (!res.ok)
        throw new Error(
          (data as { error?: { message?: string } } | null)?.error?.message ??
            `The server answered ${res.status}.`,
        );
      return data as TBrandingDto;
    },
    onSuccess: (b) => qc.setQueryData(reportKeys.branding(), b),
  });
}
