import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/query/api-fetch";

/** The fields of a duty cycle the estimate form needs, read from the duty-cycles API. */
export type TDutyCycleChoice = { id: string; name: string; status: string; customerId: string };

export const dutyCycleChoiceKeys = {
  byCustomer: (customerId: string) => ["duty-cycles", "choices", customerId] as const,
};

export function useDutyCycleChoices(customerId: string | null) {
  return useQuery({
    queryKey: dutyCycleChoiceKeys.byCustomer(customerId ?? ""),
    enabled: !!customerId,
    queryFn: async () => {
      const page = await apiFetch<{ items: TDutyCycleChoice[] }>(
        `/api/v1/duty-cycles?customerId=${customerId}&pageSize=100`,
      );
      return page.items;
    },
  });
}
