/**
 * The browser side of our REST routes: JSON in and out, typed errors that keep the server's
 * field issues (shown beside the field) and, on 409, the current record (shown as what changed).
 */
import { ApiError as SharedApiError } from "@/components/providers";

export interface FieldIssue {
  path: string;
  message: string;
}

/** The app-wide ApiError (components/providers.tsx, which skips retries on 4xx) plus the full response body. */
export class ApiError extends SharedApiError {
  declare readonly issues: FieldIssue[];
  constructor(
    status: number,
    message: string,
    issues: FieldIssue[],
    current: unknown,
    readonly body: unknown,
  ) {
    super(status, message, issues, current);
  }
}

export async function callApi<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? "GET",
    headers: init.body !== undefined ? { "content-type": "application/json" } : undefined,
    body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
    credentials: "same-origin",
  });
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = { error: text };
  }
  if (!res.ok) {
    const body = (json ?? {}) as { error?: string; issues?: FieldIssue[]; current?: unknown };
    throw new ApiError(res.status, body.error ?? `request failed (${res.status})`, body.issues ?? [], body.current, json);
  }
  return json as T;
}

/** Issues keyed by path, for showing each beside its field. */
export function issuesByPath(error: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  if (error instanceof ApiError) for (const i of error.issues) if (out[i.path] === undefined) out[i.path] = i.message;
  return out;
}
