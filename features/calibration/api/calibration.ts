import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { apiErrorOf, apiFetch, toQueryString } from "@/lib/query/api-fetch";
import type {
  TMachineCalibrationDto,
  TTyrePlanDto,
} from "@/features/calibration/schemas/calibration";
import type { TReadingDto } from "@/features/calibration/schemas/reading";

export const calibrationKeys = {
  all: ["calibration"] as const,
  machine: (id: string) => [...calibrationKeys.all, "machine", id] as const,
  plans: () => [...calibrationKeys.all, "plan"] as const,
  plan: (q: Record<string, string>) => [...calibrationKeys.plans(), q] as const,
};

export const machineCalibrationOptions = (id: string) =>
  queryOptions({
    queryKey: calibrationKeys.machine(id),
    queryFn: () => apiFetch<TMachineCalibrationDto>(`/api/v1/machines/${id}/calibration`),
  });

export const tyrePlanOptions = (q: Record<string, string> = {}) =>
  queryOptions({
    queryKey: calibrationKeys.plan(q),
    queryFn: () => apiFetch<TTyrePlanDto>(`/api/v1/tyre-plan${toQueryString(q)}`),
  });

export const useMachineCalibration = (id: string) => useQuery(machineCalibrationOptions(id));
export const useTyrePlan = (q: Record<string, string> = {}) => useQuery(tyrePlanOptions(q));

/** A new or removed reading changes the machine's fit, the pool's and every plan. */
function useInvalidateCalibration() {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: calibrationKeys.all });
}

/** Sends a reading with its photos as multipart (the photos are files, not JSON). */
export function useRecordReading(machineId: string) {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: async ({ reading, photos }: { reading: unknown; photos: File[] }) => {
      const form = new FormData();
      form.set("reading", JSON.stringify(reading));
      for (const p of photos) form.append("photos", p, p.name);
      const res = await fetch(`/api/v1/machines/${machineId}/readings`, {
        method: "POST",
        body: form,
      });
      const data: unknown = await res.json().catch(() => null);
      if (!res.ok) throw apiErrorOf(res.status, data);
      return data as TReadingDto;
    },
    onSuccess: invalidate,
  });
}

export function useDeleteReading() {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ deleted: boolean }>(`/api/v1/readings/${id}`, { method: "DELETE" }),
    onSuccess: invalidate,
  });
}

export function useImportReadings(machineId: string) {
  const invalidate = useInvalidateCalibration();
  return useMutation({
    mutationFn: (body: { csv: string; depthUnit: "mm" | "in"; measuredBy: string }) =>
      apiFetch<{ imported: number }>(`/api/v1/machines/${machineId}/readings/import`, {
        method: "POST",
        body,
      }),
    onSuccess: invalidate,
  });
}

export function useCreateCalibratedEstimate(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiFetch<{ id: string }>(`/api/v1/machines/${machineId}/calibration`, { method: "POST" }),
    onSuccess: () => qc.invalidateQueries({ queryKey: ["estimates"] }),
  });
}
