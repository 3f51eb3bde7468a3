import type { LoadCase } from "../types";
import { createCaseScratch, evaluateCase, type CaseScratch } from "./evaluate-case";
import type { PreparedMember } from "./prepare-member";

const shared: CaseScratch = createCaseScratch();

/**
 * Utilization of one load case without building any output (for searches): the same
 * number checkResolved reports for the case, or Infinity when the case fails outright
 * (unstable, over the 1.4 cap 6.2.5.3, Pu > φPn,max, sway data missing).
 *
 * @param prep from prepareMember
 * @param load one factored load case (kip, kip-in)
 * @example caseUtilization(prep, loads[0]) // 0.87
 */
export function caseUtilization(prep: PreparedMember, load: LoadCase): number {
  return evaluateCase(prep, load, shared);
}

/**
 * Largest case utilization over the loads, trying `order` first (e.g. the case that governed
 * a similar candidate) and stopping as soon as one exceeds `stopAbove` (then the returned
 * value is only known to exceed it).
 *
 * @param prep from prepareMember
 * @param loads load cases
 * @param stopAbove early-exit threshold (default Infinity: evaluate all)
 * @param first index of the case to evaluate first (default 0)
 * @returns `{ utilization, index }` of the governing (or first exceeding) case
 * @example governingUtilization(prep, loads, 1.0, lastGoverning)
 */
export function governingUtilization(
  prep: PreparedMember,
  loads: readonly LoadCase[],
  stopAbove = Infinity,
  first = 0,
): { utilization: number; index: number } {
  const n = loads.length;
  let best = -Infinity;
  let index = -1;
  const start = first >= 0 && first < n ? first : 0;
  for (let j = 0; j < n; j++) {
    const i = j === 0 ? start : j <= start ? j - 1 : j;
    const u = evaluateCase(prep, loads[i] as LoadCase, shared);
    if (u > best) {
      best = u;
      index = i;
      if (u > stopAbove) break;
    }
  }
  return { utilization: best, index };
}
