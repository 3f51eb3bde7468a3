/**
 * Running a search: in-process (tests, scripts, small requests) or on the piscina pool (the
 * CLI, the web app's search worker process). Both run the same tasks (run-task.ts) and the
 * same merge, so they give the same fronts and best.
 */
import { parseOptimizeRequest, type OptimizeRequest, type ValidationErrorBody } from "../lib/validation/optimize-request";
import { mergeResults, regionsOf, type OptimizeResult } from "./merge-results";
import { runSearchTask, searchAssumptions, type SearchTask, type TaskResult } from "./run-task";
import { buildSearchProblem } from "./search-space";
import { cancelShared, createSharedBounds, readProgress, type SharedBounds } from "./shared-bounds";

/** Progress of a running search. */
export interface SearchProgress {
  /** fraction of the candidate space visited, 0…1 */
  fraction: number;
  /** passing candidates kept so far */
  kept: number;
}

export interface SearchOptions {
  /** parts the families are dealt into (default: threads) */
  parts?: number;
  /** evaluate every candidate in full (for comparison and benchmarks) */
  exhaustive?: boolean;
  onProgress?: (p: SearchProgress) => void;
  signal?: AbortSignal;
}

/** Invalid input, carrying the contract's error body. */
export class OptimizeInputError extends Error {
  readonly body: ValidationErrorBody;
  constructor(body: ValidationErrorBody) {
    super(body.error);
    this.name = "OptimizeInputError";
    this.body = body;
  }
}

/** Thrown (as the rejection) when a search is cancelled through its AbortSignal. */
export class SearchCancelledError extends Error {
  constructor() {
    super("search cancelled");
    this.name = "AbortError";
  }
}

export function validateRequest(request: unknown): OptimizeRequest {
  const r = parseOptimizeRequest(request);
  if (!r.ok) throw new OptimizeInputError(r.error);
  return r.value;
}

function progressOf(shared: SharedBounds): SearchProgress {
  const p = readProgress(shared);
  return { fraction: p.candidates > 0 ? Math.min(1, p.visited / p.candidates) : 0, kept: p.kept };
}

export function finish(request: OptimizeRequest, results: TaskResult[], t0: number, threads: number, exhaustive: boolean): OptimizeResult {
  const problem = buildSearchProblem(request);
  return mergeResults(
    [...results].sort((a, b) => a.part - b.part),
    {
      ms: performance.now() - t0,
      threads,
      exhaustive,
      regionsInSpace: regionsOf(problem.shapes, problem.confinements),
      assumptions: searchAssumptions(problem),
    },
  );
}

/**
 * Runs a search in this thread (parts one after another, sharing bounds as the pool does).
 *
 * @throws OptimizeInputError for an invalid request; SearchCancelledError when aborted
 * @example const result = runSearchInProcess(request); result.best?.id
 */
export function runSearchInProcess(request: unknown, options: SearchOptions = {}): OptimizeResult {
  const t0 = performance.now();
  const req = validateRequest(request);
  const parts = Math.max(1, options.parts ?? 1);
  const shared = createSharedBounds();
  const results: TaskResult[] = [];
  let lastReport = 0;
  const onTick = () => {
    if (options.onProgress === undefined) return;
    const now = performance.now();
    if (now - lastReport < 50) return;
    lastReport = now;
    options.onProgress(progressOf(shared));
  };
  for (let part = 0; part < parts; part++) {
    if (options.signal?.aborted) throw new SearchCancelledError();
    const task: SearchTask = { request: req, part, parts, exhaustive: options.exhaustive === true, shared };
    results.push(runSearchTask(task, { onTick, signal: options.signal }));
  }
  if (options.signal?.aborted) throw new SearchCancelledError();
  options.onProgress?.({ fraction: 1, kept: readProgress(shared).kept });
  return finish(req, results, t0, 1, options.exhaustive === true);
}

export { cancelShared };
