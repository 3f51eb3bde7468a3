/**
 * An exact combinatorial branch and bound over outlines (open / closed), the fallback when the
 * integer program does not finish in its time limit. Each node is bounded by the Lagrangian
 * bound (lagrangian-bound.ts), which is valid for every node; a node is pruned only when its
 * bound shows that no assignment under it beats the incumbent, and a node whose outlines are all
 * fixed is evaluated exactly. So the search ends with a proven optimum.
 */
import { evaluateOutlineSet, openSet } from "./evaluate-outline-set";
import { boundByLagrangian, cannotBeat, fixOutlinesByBound, type OutlineState, type RelaxedCosts } from "./lagrangian-bound";
import type { PreparedProject } from "./prepare-project";
import type { StandardizeCandidate } from "./types";

export interface BranchAndBoundResult {
  /** best outline set found (null when none is feasible) */
  set: number[] | null;
  totalCents: number;
  /** false when the time limit ended the search (the set is then not proven optimal) */
  finished: boolean;
  nodes: number;
}

interface Node {
  state: OutlineState;
  lambda?: Float64Array;
}

export function solveByBranchAndBound<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  rc: RelaxedCosts,
  maxOutlines: number,
  incumbent: { set: number[] | null; totalCents: number },
  opts: { state?: OutlineState; timeLimitMs?: number } = {},
): BranchAndBoundResult {
  const nO = p.outlines.length;
  const deadline = opts.timeLimitMs === undefined ? Number.POSITIVE_INFINITY : performance.now() + opts.timeLimitMs;
  let bestSet = incumbent.set;
  let best = incumbent.totalCents;
  const consider = (set: number[]) => {
    const v = evaluateOutlineSet(p, openSet(nO, set));
    if (v.uncovered === 0 && v.totalCents < best) {
      best = v.totalCents;
      bestSet = v.used;
    }
  };
  const stack: Node[] = [{ state: opts.state !== undefined ? Int8Array.from(opts.state) : new Int8Array(nO) }];
  let nodes = 0;
  while (stack.length > 0) {
    if (performance.now() > deadline) return { set: bestSet, totalCents: best, finished: false, nodes };
    const node = stack.pop() as Node;
    nodes++;
    const state = node.state;
    const res = boundByLagrangian(rc, state, maxOutlines, best, node.lambda === undefined ? 300 : 80, node.lambda);
    if (!Number.isFinite(res.bound) || cannotBeat(res.bound, best)) continue;
    consider(res.selected);
    if (cannotBeat(res.bound, best)) continue;
    fixOutlinesByBound(res, state, maxOutlines, best);
    let forced = 0;
    const free: number[] = [];
    for (let o = 0; o < nO; o++) {
      if (state[o] === 1) forced++;
      else if (state[o] === 0) free.push(o);
    }
    if (forced > maxOutlines) continue;
    if (free.length === 0 || forced === maxOutlines) {
      // every outline decided (the free ones cannot be opened): evaluate exactly
      const open: number[] = [];
      for (let o = 0; o < nO; o++) if (state[o] === 1) open.push(o);
      consider(open);
      continue;
    }
    // branch on the most attractive free outline of the relaxed solution
    let pick = -1;
    let pickRho = Number.POSITIVE_INFINITY;
    const selectedFree = res.selected.filter((o) => state[o] === 0);
    for (const o of selectedFree.length > 0 ? selectedFree : free) {
      const r = res.rho[o] as number;
      if (r < pickRho) {
        pickRho = r;
        pick = o;
      }
    }
    if (pick < 0) pick = free[0] as number;
    const closedChild = Int8Array.from(state);
    closedChild[pick] = -1;
    const openChild = Int8Array.from(state);
    openChild[pick] = 1;
    stack.push({ state: closedChild, lambda: res.lambda });
    stack.push({ state: openChild, lambda: res.lambda });
  }
  return { set: bestSet, totalCents: best, finished: true, nodes };
}
