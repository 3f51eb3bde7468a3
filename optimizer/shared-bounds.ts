/**
 * Known passing points, progress counters and the cancel flag of one search, in a
 * SharedArrayBuffer that every worker thread of the search sees. A worker publishes each
 * passing candidate it evaluates in full; the others merge those points into their own
 * staircases. Only real, evaluated points are ever written, so whatever a worker has or has
 * not seen yet, its pruning stays a proof (see sweep.ts); sharing only makes it prune more.
 */
import { Staircase } from "./pareto-front";
import type { BoundExchange } from "./sweep";

const CTL = 8; // int32 slots: 0 cancel, 1 points written, 2 visited, 3 kept, 4 candidates announced, 5 parts announced
const CAPACITY = 1 << 15;

export interface SharedBounds {
  buffer: SharedArrayBuffer;
}

/** A fresh shared area for one search. */
export function createSharedBounds(): SharedBounds {
  const bytes = CTL * 4 + CAPACITY * 4 + CAPACITY * 3 * 8;
  return { buffer: new SharedArrayBuffer(bytes) };
}

function views(buffer: SharedArrayBuffer) {
  const ctl = new Int32Array(buffer, 0, CTL);
  const ready = new Int32Array(buffer, CTL * 4, CAPACITY);
  const pts = new Float64Array(buffer, CTL * 4 + CAPACITY * 4, CAPACITY * 3);
  return { ctl, ready, pts };
}

/** Asks every worker of the search to stop at its next check (within a few candidates). */
export function cancelShared(b: SharedBounds): void {
  Atomics.store(views(b.buffer).ctl, 0, 1);
}

/** Progress so far: candidates visited and passing candidates kept, over all workers. */
export function readProgress(b: SharedBounds): { visited: number; kept: number; candidates: number; parts: number } {
  const { ctl } = views(b.buffer);
  return { visited: Atomics.load(ctl, 2), kept: Atomics.load(ctl, 3), candidates: Atomics.load(ctl, 4), parts: Atomics.load(ctl, 5) };
}

/** The exchange one worker (or the in-process search) uses. */
export function sharedExchange(
  b: SharedBounds,
  signal?: AbortSignal,
): BoundExchange & { tick(visited: number): void; announce(candidates: number): void } {
  const { ctl, ready, pts } = views(b.buffer);
  let seen = 0;
  const cancelled = () => Atomics.load(ctl, 0) === 1 || signal?.aborted === true;
  return {
    pull(util: Staircase, carbon: Staircase) {
      const written = Math.min(Atomics.load(ctl, 1), CAPACITY);
      while (seen < written) {
        if (Atomics.load(ready, seen) === 0) break; // being written; read it next time
        const a = pts[seen * 3] as number;
        util.add(a, pts[seen * 3 + 1] as number);
        carbon.add(a, pts[seen * 3 + 2] as number);
        seen++;
      }
    },
    push(cents: number, utilUnits: number, carbonUnits: number) {
      Atomics.add(ctl, 3, 1);
      const k = Atomics.add(ctl, 1, 1);
      if (k >= CAPACITY) return; // full: pruning just gets a little weaker
      pts[k * 3] = cents;
      pts[k * 3 + 1] = utilUnits;
      pts[k * 3 + 2] = carbonUnits;
      Atomics.store(ready, k, 1);
    },
    cancelled,
    tick(visited: number) {
      Atomics.add(ctl, 2, visited);
    },
    announce(candidates: number) {
      Atomics.add(ctl, 4, candidates);
      Atomics.add(ctl, 5, 1);
    },
  };
}
