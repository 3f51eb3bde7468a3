"use client";
/**
 * Client-side providers for the whole app: the next-auth session (useSession, signIn, signOut) and
 * one TanStack Query client per browser tab. Wired once in app/layout.tsx.
 */
import { SessionProvider } from "next-auth/react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";

export interface ProvidersProps {
  children: ReactNode;
}

export function Providers({ children }: ProvidersProps) {
  const [queryClient] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          queries: { staleTime: 15_000, retry: (count, error) => count < 2 && !(error instanceof ApiError && error.status < 500) },
        },
      }),
  );
  return (
    <SessionProvider refetchOnWindowFocus={false}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </SessionProvider>
  );
}

/** The error a failed API call throws: status, message and the server's field issues. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: { path: string; message: string }[] = [],
    readonly current?: unknown,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/**
 * fetch for our JSON routes: same-origin, JSON in and out; a non-2xx answer throws ApiError with the
 * server's message and field issues (the shape lib/api/handler.ts produces).
 */
export async function fetchJson<T>(url: string, init: { method?: string; body?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? (init.body === undefined ? "GET" : "POST"),
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    credentials: "same-origin",
    signal: init.signal,
  });
  const text = await res.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = null;
  }
  if (!res.ok) {
    const body = (data ?? {}) as { error?: string; issues?: { path: string; message: string }[]; current?: unknown };
    throw new ApiError(res.status, body.error ?? `the server answered ${res.status}`, body.issues ?? [], body.current);
  }
  return data as T;
}
