/**
 * A good (not proven) set of at most N outlines: greedy addition, then local search by adding,
 * dropping and swapping single outlines until no move helps. Its value is the upper bound that
 * the exact methods start from; it proves nothing by itself.
 */
import { evaluateOutlineSet, isBetterValue, openSet, type OutlineSetValue } from "./evaluate-outline-set";
import type { PreparedProject } from "./prepare-project";
import type { StandardizeCandidate } from "./types";

export interface ImprovedSet<C extends StandardizeCandidate> {
  set: number[];
  value: OutlineSetValue<C>;
}

/**
 * @param start a set to start from instead of the greedy one (e.g. the optimum for N − 1)
 * @param allowed outlines that may be used (default all)
 */
export function improveOutlineSet<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  maxOutlines: number,
  start?: readonly number[],
  allowed?: Uint8Array,
): ImprovedSet<C> {
  const n = p.outlines.length;
  const candidates: number[] = [];
  for (let o = 0; o < n; o++) if (allowed === undefined || allowed[o] === 1) candidates.push(o);
  const evaluate = (s: readonly number[]) => evaluateOutlineSet(p, openSet(n, s));

  let set: number[] = [];
  let value = evaluate(set);
  if (start !== undefined && start.length <= maxOutlines) {
    set = [...start];
    value = evaluate(set);
  } else {
    while (set.length < maxOutlines) {
      let bestO = -1;
      let bestV = value;
      for (const o of candidates) {
        if (set.includes(o)) continue;
        const v = evaluate([...set, o]);
        if (isBetterValue(v, bestV)) {
          bestV = v;
          bestO = o;
        }
      }
      if (bestO < 0) break;
      set.push(bestO);
      value = bestV;
    }
  }
  set = [...value.used];

  for (let pass = 0; pass < 100; pass++) {
    let bestSet: number[] | null = null;
    let bestV = value;
    const consider = (s: number[]) => {
      const v = evaluate(s);
      if (isBetterValue(v, bestV)) {
        bestV = v;
        bestSet = v.used;
      }
    };
    for (const o of set) consider(set.filter((x) => x !== o));
    for (const o of candidates) {
      if (set.includes(o)) continue;
      if (set.length < maxOutlines) consider([...set, o]);
      for (const r of set) consider([...set.filter((x) => x !== r), o]);
    }
    if (bestSet === null) break;
    set = bestSet;
    value = bestV;
  }
  return { set, value };
}
