"use client";
/**
 * Gives a subtree a TanStack QueryClient when the app's providers have not (the shared one from
 * components/providers.tsx wins whenever it is there).
 */
import { useContext, useState, type ReactNode } from "react";
import { QueryClient, QueryClientContext, QueryClientProvider } from "@tanstack/react-query";

export function QueryBoundary({ children }: { children: ReactNode }) {
  const existing = useContext(QueryClientContext);
  const [own] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 10_000, retry: 1, refetchOnWindowFocus: false } } }));
  if (existing) return <>{children}</>;
  return <QueryClientProvider client={own}>{children}</QueryClientProvider>;
}
