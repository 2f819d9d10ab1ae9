import { QueryClient } from "@tanstack/react-query";

/** Shared TanStack Query defaults: one client per request on the server, one per tab in the browser. */
export function makeQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) => {
          // Do not retry what the server refused on purpose (4xx).
          const status = (error as { status?: number }).status;
          if (status && status >= 400 && status < 500) return false;
          return failureCount < 2;
        },
      },
    },
  });
}
