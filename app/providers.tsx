"use client";

import { QueryClientProvider, type QueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { makeQueryClient } from "@/lib/query/query-client";
import { Toaster } from "@/lib/ui/toast";

export function Providers({ children }: { children: ReactNode }) {
  const [client] = useState<QueryClient>(() => makeQueryClient());
  return (
    <QueryClientProvider client={client}>
      {children}
      <Toaster />
    </QueryClientProvider>
  );
}
