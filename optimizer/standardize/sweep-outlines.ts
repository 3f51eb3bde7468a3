/**
 * Total cost against the number of distinct outlines: one standardization per N from 1 to the
 * number of marks (more outlines than marks can never help: each mark uses one).
 *
 * Work is shared between the N: the fewest outlines any assignment needs (K) is found once and
 * every N below it is infeasible without a solve; the optimum for N − 1 is a starting set for N;
 * and when the unconstrained optimum (N = number of marks) uses k outlines it is also the optimum
 * for every N ≥ k (it is feasible there, and no N can do better than the unconstrained problem).
 */
import { prepareProject } from "./prepare-project";
import { countMinimumOutlines, findStructuralReasons, solvePrepared, type StandardizeSolveOptions } from "./standardize-project";
import type { StandardizeCandidate, StandardizeInput, StandardizeResult } from "./types";

/** One result per N = 1 … number of marks (`input.maxOutlines` is ignored). */
export function sweepOutlines<C extends StandardizeCandidate>(
  input: Omit<StandardizeInput<C>, "maxOutlines"> & { maxOutlines?: number },
  options: StandardizeSolveOptions = {},
): StandardizeResult<C>[] {
  const nMarks = input.marks.length;
  const full: StandardizeInput<C> = { ...input, maxOutlines: Math.max(1, nMarks) };
  const pFull = prepareProject(full);
  const structural = findStructuralReasons(pFull, full);
  const atN = (N: number) => ({ ...pFull, maxOutlines: N });
  if (structural.length > 0) {
    return Array.from({ length: nMarks }, (_, i) => solvePrepared(atN(i + 1), { ...full, maxOutlines: i + 1 }, options));
  }
  const minOutlines = countMinimumOutlines(pFull);
  const unconstrained = solvePrepared(pFull, full, options, { minOutlines });
  const kFree = unconstrained.feasible ? unconstrained.outlines.length : nMarks + 1;
  const keyIndex = new Map(pFull.outlines.map((o, i) => [o.key, i]));
  const setOf = (r: StandardizeResult<C>) => r.outlines.map((o) => keyIndex.get(o.key) as number);

  const results: StandardizeResult<C>[] = [];
  let previous: number[] | null = null;
  for (let N = 1; N <= nMarks; N++) {
    let r: StandardizeResult<C>;
    if (N >= kFree) {
      r = { ...unconstrained, maxOutlines: N };
    } else if (minOutlines !== null && N < minOutlines) {
      r = solvePrepared(atN(N), { ...full, maxOutlines: N }, options, { minOutlines });
    } else {
      const hints = { minOutlines, startSets: previous === null ? [] : [previous] };
      r = solvePrepared(atN(N), { ...full, maxOutlines: N }, options, hints);
    }
    if (r.feasible) previous = setOf(r);
    results.push(r);
  }
  return results;
}
