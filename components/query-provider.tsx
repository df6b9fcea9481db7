"use client";
// One TanStack Query client per browser tab, created lazily so a server render
// never shares cached data between people. Wrap only the client parts that
// fetch; the signed-in shell does not need it.
import { useState } from "react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";

export function QueryProvider({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          // Upload state changes on the server only; a refetch on focus is enough.
          queries: { staleTime: 1_000, retry: 1, refetchOnWindowFocus: true },
        },
      }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
