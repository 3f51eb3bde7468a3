/**
 * What a worker process does with one search job: take the search row, run the optimizer with
 * live progress written to the database, stop when someone cancels, and store the results in one
 * transaction. Pure orchestration; the search itself is the optimizer's.
 */
import { beatSearch, claimSearch, completeSearch, recordProgress, type StoredCandidate } from "@/db/queries/searches";

export interface SearchProgress {
  /** fraction of the candidate space done, 0…1 */
  fraction: number;
  /** passing candidates kept so far */
  kept: number;
}

export interface SearchEntry {
  id: string;
  shape: string;
  cost: number;
  carbon: number;
  utilization: number;
}

export interface SearchOutcome {
  front: SearchEntry[];
  /** every passing candidate the search evaluated (front members included), when it reports them */
  passing?: SearchEntry[];
  stats: unknown;
  [extra: string]: unknown;
}

export type SearchRunner = (
  request: unknown,
  options: { onProgress: (p: SearchProgress) => void; signal: AbortSignal },
) => Promise<SearchOutcome>;

export type JobResult = "done" | "cancelled" | "skipped";

const PROGRESS_WRITE_MS = 250;
/** Heartbeat period; a search silent for several beats is taken to have lost its worker. */
export const HEARTBEAT_MS = 400;
/** Upper bound on rows stored per search; the front is always stored whole. */
export const MAX_STORED_CANDIDATES = 5000;

export function toStoredCandidates(outcome: SearchOutcome): StoredCandidate[] {
  const frontIds = new Set(outcome.front.map((e) => e.id));
  const byId = new Map<string, SearchEntry>();
  for (const entry of outcome.front) byId.set(entry.id, entry);
  for (const entry of outcome.passing ?? []) {
    if (byId.size >= MAX_STORED_CANDIDATES && !frontIds.has(entry.id)) break;
    if (!byId.has(entry.id)) byId.set(entry.id, entry);
  }
  return [...byId.values()].map((entry) => ({
    candidateId: entry.id,
    shape: entry.shape,
    cost: entry.cost,
    carbon: entry.carbon,
    utilization: entry.utilization,
    onFront: frontIds.has(entry.id),
    data: entry,
  }));
}

export async function processSearchJob(searchId: string, run: SearchRunner): Promise<JobResult> {
  const search = await claimSearch(searchId);
  if (!search) return "skipped";

  const controller = new AbortController();
  let lastWrite = 0;
  let latest: SearchProgress = { fraction: 0, kept: 0 };
  let writing: Promise<void> = Promise.resolve();

  const onProgress = (progress: SearchProgress) => {
    latest = progress;
    const now = Date.now();
    if (now - lastWrite < PROGRESS_WRITE_MS) return;
    lastWrite = now;
    writing = writing.then(() => recordProgress(searchId, latest.fraction, latest.kept)).catch(() => undefined);
  };
  // Cancellation is a database fact (another process sets it): the heartbeat reads it every beat.
  const poll = setInterval(() => {
    beatSearch(searchId)
      .then((status) => {
        if (status !== "running") controller.abort();
      })
      .catch(() => undefined);
  }, HEARTBEAT_MS);

  try {
    const outcome = await run(search.request, { onProgress, signal: controller.signal });
    await writing;
    if (controller.signal.aborted) return "cancelled";
    const stored = await completeSearch(searchId, toStoredCandidates(outcome), outcome.stats);
    return stored ? "done" : "cancelled";
  } catch (error) {
    if (controller.signal.aborted) return "cancelled";
    throw error;
  } finally {
    clearInterval(poll);
  }
}
