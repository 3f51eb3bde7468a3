"use client";
/**
 * Live state of one search: a progress bar with the number of passing candidates kept, polled from
 * GET /api/searches/{id} every half second while the search is queued or running, and a Cancel
 * button for the roles that may run searches.
 */
import { useEffect, useRef } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi } from "@/components/projects/api";
import { formatNumber } from "@/components/projects/units";
import { STATUS_WORDS, isActive, type SearchView } from "./search-types";

export interface SearchProgressProps {
  search: SearchView;
  canCancel: boolean;
  /** called once when the search leaves the queued/running states */
  onSettled?: (search: SearchView) => void;
}

export const searchKey = (searchId: string) => ["search", searchId] as const;

/** Polls one search while it is active; the list row is the starting value. */
export function useLiveSearch(initial: SearchView) {
  return useQuery({
    queryKey: searchKey(initial.id),
    queryFn: () => callApi<{ search: SearchView }>(`/api/searches/${initial.id}`).then((r) => r.search),
    initialData: initial,
    initialDataUpdatedAt: 0,
    refetchInterval: (query) => (query.state.data && isActive(query.state.data.status) ? 500 : false),
    refetchIntervalInBackground: true,
  });
}

export function SearchProgress({ search: initial, canCancel, onSettled }: SearchProgressProps) {
  const queryClient = useQueryClient();
  const live = useLiveSearch(initial);
  const search = live.data;
  const settledRef = useRef(!isActive(initial.status));
  useEffect(() => {
    if (!settledRef.current && !isActive(search.status)) {
      settledRef.current = true;
      onSettled?.(search);
    }
  }, [search, onSettled]);
  const cancel = useMutation({
    mutationFn: () => callApi<{ search: SearchView | null }>(`/api/searches/${search.id}/cancel`, { method: "POST" }),
    onSettled: () => void queryClient.invalidateQueries({ queryKey: searchKey(search.id) }),
  });
  const percent = Math.round(search.progress * 100);
  const active = isActive(search.status);
  return (
    <div className="space-y-2" data-testid={`search-progress-${search.id}`}>
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span className="font-medium" data-testid="search-status">
          {STATUS_WORDS[search.status]}
          {search.attempt > 1 && active ? ` (attempt ${search.attempt})` : ""}
        </span>
        <span className="tabular-nums text-ink-700" data-testid="search-kept">
          {formatNumber(search.kept, 0)} passing candidate{search.kept === 1 ? "" : "s"} kept
        </span>
        {active && canCancel ? (
          <button type="button" className="btn-quiet ml-auto" onClick={() => cancel.mutate()} disabled={cancel.isPending}>
            {cancel.isPending ? "Cancelling…" : "Cancel search"}
          </button>
        ) : null}
      </div>
      {active || search.status === "done" ? (
        <div
          role="progressbar"
          aria-label="Search progress"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          aria-valuetext={`${percent} % of the candidate space, ${search.kept} kept`}
          className="h-2.5 w-full overflow-hidden rounded-full bg-stone-100"
        >
          <div className={`h-full ${search.status === "done" ? "bg-sound-600" : "bg-oxide-500"} transition-[width]`} style={{ width: `${percent}%` }} />
        </div>
      ) : null}
      {active ? <p className="text-xs text-ink-500">{percent} % of the candidate space examined</p> : null}
      {search.status === "failed" && search.error ? (
        <p role="alert" className="text-sm text-strained-600">
          The search failed: {search.error}
        </p>
      ) : null}
      {cancel.isError ? (
        <p role="alert" className="text-sm text-strained-600">
          Could not cancel: {cancel.error.message}
        </p>
      ) : null}
    </div>
  );
}
