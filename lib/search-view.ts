import type { SearchRow } from "@/db/queries/searches";

/** What the client sees of a search: status and progress, never the worker's internals. */
export function toSearchView(row: SearchRow, currentInputsHash: string | null) {
  return {
    id: row.id,
    markId: row.markId,
    status: row.status,
    progress: row.progress,
    kept: row.kept,
    stats: row.stats,
    error: row.error,
    attempt: row.attempt,
    priceBookId: row.priceBookId,
    stale: currentInputsHash !== null && row.inputsHash !== currentInputsHash,
    createdAt: row.createdAt,
    startedAt: row.startedAt,
    finishedAt: row.finishedAt,
    version: row.version,
  };
}
