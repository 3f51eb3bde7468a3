/**
 * The piscina thread pool of the optimizer and searches run on it.
 *
 * The worker is the bundle dist/workers/optimizer-worker.mjs (scripts/build-workers.mjs, run
 * by `npm run build`), found from process.cwd() so that it survives Next.js bundling; the pool
 * is created once per process and kept on globalThis (stack-notes.md, worker threads).
 * A search deals its families into `threads` parts and runs them concurrently, one task per
 * thread; the parts share known passing points and the cancel flag through a
 * SharedArrayBuffer.
 */
import { existsSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Piscina } from "piscina";
import type { SearchRunner } from "../lib/jobs/process-search-job";
import type { OptimizeResult } from "./merge-results";
import type { SearchTask, TaskResult } from "./run-task";
import { finish, SearchCancelledError, validateRequest, type SearchOptions, type SearchProgress } from "./run-search";
import { cancelShared, createSharedBounds, readProgress } from "./shared-bounds";

/** Where the worker bundle lives (relative to the project root). */
export const WORKER_BUNDLE = path.join("dist", "workers", "optimizer-worker.mjs");

interface PoolHolder {
  pools: Map<string, Piscina>;
}

const holder = ((globalThis as { __caryatidOptimizerPools?: PoolHolder }).__caryatidOptimizerPools ??= { pools: new Map() });

export interface PoolOptions {
  /** worker file; default path.join(process.cwd(), WORKER_BUNDLE) */
  filename?: string;
  /** threads in the pool; default os.availableParallelism() */
  maxThreads?: number;
}

/**
 * The optimizer's pool for this process (created on first use).
 * @throws Error when the worker bundle has not been built
 */
export function getOptimizerPool(options: PoolOptions = {}): Piscina {
  const filename = options.filename ?? path.join(process.cwd(), WORKER_BUNDLE);
  const maxThreads = options.maxThreads ?? Math.max(1, os.availableParallelism());
  const key = `${filename}|${maxThreads}`;
  let pool = holder.pools.get(key);
  if (pool === undefined) {
    if (!existsSync(filename)) {
      throw new Error(`optimizer worker bundle ${filename} is missing: run \`node scripts/build-workers.mjs\` (part of npm run build)`);
    }
    pool = new Piscina({ filename, minThreads: 0, maxThreads, idleTimeout: 30_000 });
    holder.pools.set(key, pool);
  }
  return pool;
}

/** Closes every optimizer pool of this process (tests, scripts that must exit). */
export async function closeOptimizerPools(): Promise<void> {
  const pools = [...holder.pools.values()];
  holder.pools.clear();
  await Promise.all(pools.map((p) => p.destroy()));
}

export interface PoolSearchOptions extends SearchOptions {
  /** parallel parts (= threads used); default request.threads, else the pool's size */
  threads?: number;
  pool?: Piscina;
  /** how often progress is reported, ms (default 100) */
  progressMs?: number;
}

/**
 * Runs a search on the pool with progress events and cancellation.
 *
 * @throws OptimizeInputError for an invalid request (before any thread starts);
 *   SearchCancelledError (name "AbortError") when `signal` aborts: every part stops within a
 *   few candidates and the promise rejects once they have
 * @example await runSearchOnPool(request, { onProgress: (p) => console.log(p.fraction), signal })
 */
export async function runSearchOnPool(request: unknown, options: PoolSearchOptions = {}): Promise<OptimizeResult> {
  const t0 = performance.now();
  const req = validateRequest(request);
  if (options.signal?.aborted) throw new SearchCancelledError();
  const pool = options.pool ?? getOptimizerPool();
  const threads = Math.max(1, Math.min(options.threads ?? req.threads ?? pool.maxThreads, pool.maxThreads));
  const parts = Math.max(threads, options.parts ?? threads);
  const shared = createSharedBounds();
  const exhaustive = options.exhaustive === true;
  const onAbort = () => cancelShared(shared);
  options.signal?.addEventListener("abort", onAbort, { once: true });
  let timer: ReturnType<typeof setInterval> | undefined;
  const report = (): SearchProgress => {
    const p = readProgress(shared);
    return { fraction: p.candidates > 0 && p.parts === parts ? Math.min(1, p.visited / p.candidates) : 0, kept: p.kept };
  };
  if (options.onProgress) {
    const cb = options.onProgress;
    timer = setInterval(() => cb(report()), options.progressMs ?? 100);
  }
  try {
    // at most `threads` tasks in flight: a cancelled search leaves nothing queued
    const results: TaskResult[] = [];
    let next = 0;
    const runOne = async (): Promise<void> => {
      while (next < parts && !options.signal?.aborted) {
        const part = next++;
        const task: SearchTask = { request: req, part, parts, exhaustive, shared };
        try {
          results.push((await pool.run(task)) as TaskResult);
        } catch (e) {
          cancelShared(shared); // the other parts stop instead of waiting for this one
          throw e;
        }
      }
    };
    await Promise.all(Array.from({ length: threads }, () => runOne()));
    if (options.signal?.aborted || results.some((r) => r.cancelled)) throw new SearchCancelledError();
    const out = finish(req, results, t0, threads, exhaustive);
    options.onProgress?.({ fraction: 1, kept: out.stats.passing });
    return out;
  } finally {
    if (timer !== undefined) clearInterval(timer);
    options.signal?.removeEventListener("abort", onAbort);
  }
}

/** A SearchRunner for the job processor (lib/jobs/process-search-job.ts). */
export function poolSearchRunner(pool?: Piscina) {
  return (request: unknown, options: { onProgress: (p: SearchProgress) => void; signal: AbortSignal }) =>
    runSearchOnPool(request, { ...options, ...(pool ? { pool } : {}) });
}

// compile-time check: the runner fits the job processor's contract
export function asSearchRunner(pool?: Piscina): SearchRunner {
  return poolSearchRunner(pool);
}
