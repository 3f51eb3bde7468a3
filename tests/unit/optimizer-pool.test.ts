/**
 * The search on piscina worker threads: same answer as in process, progress events, and
 * cancellation that really stops the threads. The worker is the esbuild bundle the app uses
 * (built here when missing or stale).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Piscina } from "piscina";
import { closeOptimizerPools, getOptimizerPool, runSearchOnPool } from "../../optimizer/optimizer-pool";
import { runSearchInProcess, SearchCancelledError, type SearchProgress } from "../../optimizer/run-search";
import { mixedRequest, tenCases, prices, carbon } from "./optimizer-fixtures";

let pool: Piscina;

beforeAll(async () => {
  // @ts-expect-error -- plain ESM build script without type declarations
  const { ensureWorkerBundle } = (await import("../../scripts/build-workers.mjs")) as { ensureWorkerBundle: () => Promise<string> };
  const filename = await ensureWorkerBundle();
  pool = getOptimizerPool({ filename, maxThreads: 2 });
}, 120_000);

afterAll(async () => {
  await closeOptimizerPools();
});

/** A search big enough to be interrupted: the default space with the ten cases. */
const bigRequest = { member: { lu: 276, kx: 1, ky: 1, braced: true }, loads: tenCases, prices, carbon };

describe("search on the thread pool", () => {
  it("gives the in-process answer with 1 and with 2 threads", async () => {
    const local = runSearchInProcess(mixedRequest);
    for (const threads of [1, 2]) {
      const r = await runSearchOnPool(mixedRequest, { pool, threads });
      expect(r.stats.threads).toBe(threads);
      expect(r.best).toEqual(local.best);
      expect(r.front).toEqual(local.front);
      expect(r.carbonFront).toEqual(local.carbonFront);
      expect(r.stats.candidates).toBe(local.stats.candidates);
    }
  });

  it("reports progress: fractions never go back, end at 1, and count kept candidates", async () => {
    const events: SearchProgress[] = [];
    const r = await runSearchOnPool(mixedRequest, { pool, threads: 2, progressMs: 5, onProgress: (p) => events.push(p) });
    expect(events.length).toBeGreaterThan(1);
    for (let i = 1; i < events.length; i++) {
      expect((events[i] as SearchProgress).fraction).toBeGreaterThanOrEqual((events[i - 1] as SearchProgress).fraction);
      expect((events[i] as SearchProgress).kept).toBeGreaterThanOrEqual((events[i - 1] as SearchProgress).kept);
    }
    expect(events.at(-1)).toEqual({ fraction: 1, kept: r.stats.passing });
  });

  it("cancels: every thread stops within a moment and the pool serves the next search", async () => {
    const controller = new AbortController();
    let abortedAt = 0;
    let fractionAtAbort = 0;
    const started = performance.now();
    const run = runSearchOnPool(bigRequest, {
      pool,
      threads: 2,
      progressMs: 10,
      signal: controller.signal,
      onProgress: (p) => {
        if (abortedAt === 0 && p.fraction > 0) {
          fractionAtAbort = p.fraction;
          abortedAt = performance.now();
          controller.abort();
        }
      },
    });
    await expect(run).rejects.toBeInstanceOf(SearchCancelledError);
    const stoppedAt = performance.now();
    expect(abortedAt).toBeGreaterThan(started);
    expect(fractionAtAbort).toBeLessThan(1);
    // the threads answer within a few candidates, long before the search would have ended
    expect(stoppedAt - abortedAt).toBeLessThan(1500);
    // nothing is left running or queued
    expect(pool.queueSize).toBe(0);
    const again = await runSearchOnPool(mixedRequest, { pool, threads: 2 });
    expect(again.best?.id).toBe(runSearchInProcess(mixedRequest).best?.id);
  });

  it("rejects an already aborted search before starting a thread", async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(runSearchOnPool(mixedRequest, { pool, signal: controller.signal })).rejects.toBeInstanceOf(SearchCancelledError);
  });
});
