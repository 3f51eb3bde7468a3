"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi } from "@/components/projects/api";
import type { StandardizeAssignmentEntry, StandardizeResult } from "@/optimizer/standardize";

/** The solver's own shapes, as the route sends them (candidates stay on the server side of the screen). */
export type AssignmentEntry = Omit<StandardizeAssignmentEntry, "candidate">;
export type SweepEntry = Omit<StandardizeResult, "assignment"> & { assignment: AssignmentEntry[] };

export interface StandardizationResponse {
  formSetCost: number;
  priceBookRevision: number | null;
  missing: Array<{ markId: string; label: string; level: string }>;
  stale: Array<{ markId: string; label: string; level: string }>;
  sweep: SweepEntry[];
  codeEdition: string;
  caution: string;
}

export interface SweepOptions {
  oneFcPerLevel: boolean;
  rotatedShareForms: boolean;
}

const key = (projectId: string, options: SweepOptions) => ["standardization", projectId, options] as const;

export function useStandardization(projectId: string, options: SweepOptions, pollWhileMissing: boolean) {
  return useQuery({
    queryKey: key(projectId, options),
    queryFn: () => callApi<StandardizationResponse>(`/api/projects/${projectId}/standardization`, { method: "POST", body: options }),
    // While searches for missing marks run, look again every few seconds.
    refetchInterval: (query) => (pollWhileMissing && (query.state.data?.missing.length ?? 0) > 0 ? 3000 : false),
  });
}

export function useSearchMissing(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => callApi<{ queued: unknown[]; skipped: Array<{ label: string; reason: string }> }>(`/api/projects/${projectId}/standardization/searches`, { method: "POST" }),
    onSuccess: () => client.invalidateQueries({ queryKey: ["standardization", projectId] }),
  });
}

export function useAdoptSet(projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SweepOptions & { maxOutlines: number; comment: string }) =>
      callApi<{ adopted: Array<{ label: string; status: string; candidateId: string }> }>(`/api/projects/${projectId}/standardization/adopt`, { method: "POST", body }),
    onSuccess: () => client.invalidateQueries(),
  });
}
