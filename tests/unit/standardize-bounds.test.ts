/**
 * The Lagrangian bound and the outline fixing it drives must never cut off a better assignment.
 * Checked against enumeration of every outline subset (evaluateOutlineSet, itself checked against an
 * independent brute force in standardize.test.ts) on small invented projects, with incumbents
 * set just above the optimum so that every fixing claim is tested where it matters.
 */
import { describe, expect, it } from "vitest";
import { evaluateOutlineSet, openSet } from "../../optimizer/standardize/evaluate-outline-set";
import { inventProject } from "../../optimizer/standardize/invent-project";
import { boundByLagrangian, fixOutlinesByBound, relaxCosts } from "../../optimizer/standardize/lagrangian-bound";
import { prepareProject, type PreparedProject } from "../../optimizer/standardize/prepare-project";
import type { StandardizeCandidate } from "../../optimizer/standardize/types";

/**
 * Best total (cents) over subsets with |S| ≤ N that satisfy `keep` (Infinity when none); `used` is
 * the set of outlines the assignment really uses (an open outline no mark takes is not charged).
 */
function bestWhere<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  N: number,
  keep: (mask: number, used: readonly number[]) => boolean = () => true,
): number {
  const n = p.outlines.length;
  let best = Number.POSITIVE_INFINITY;
  for (let mask = 0; mask < 1 << n; mask++) {
    let size = 0;
    for (let i = 0; i < n; i++) if (mask & (1 << i)) size++;
    if (size > N) continue;
    const set: number[] = [];
    for (let i = 0; i < n; i++) if (mask & (1 << i)) set.push(i);
    const v = evaluateOutlineSet(p, openSet(n, set));
    if (v.uncovered === 0 && keep(mask, v.used)) best = Math.min(best, v.totalCents);
  }
  return best;
}

describe("Lagrangian bound", () => {
  let fixesChecked = 0;
  for (let seed = 41; seed <= 52; seed++) {
    it(`never exceeds the optimum and fixes soundly, seed ${seed}`, () => {
      const levels = seed % 2 === 0 ? 2 : 0;
      const input = inventProject({ seed, marks: 5, outlinesPerMark: 5, sizes: [12, 14, 16, 18, 20], formSetCost: [0, 700, 4000][seed % 3] ?? 0, levels });
      const p0 = prepareProject({ ...input, oneFcPerLevel: levels > 0 });
      expect(p0.outlines.length).toBeLessThanOrEqual(16);
      const rc = relaxCosts(p0);
      for (let N = 1; N <= 5; N++) {
        const p = { ...p0, maxOutlines: N };
        const opt = bestWhere(p, N);
        const state = new Int8Array(p.outlines.length);
        const res = boundByLagrangian(rc, state, N, opt, 400);
        if (!Number.isFinite(opt)) continue;
        expect(res.bound).toBeLessThanOrEqual(opt + 1e-6);
        // claims checked: closed (-1) "no assignment cheaper than opt + 1 uses o";
        // open (1) "every assignment cheaper than opt + 1 uses o"
        const incumbent = opt + 1;
        const fixed = Int8Array.from(state);
        fixOutlinesByBound(res, fixed, N, incumbent);
        fixed.forEach((s, o) => {
          if (s === 0) return;
          fixesChecked++;
          const other = bestWhere(p, N, (_mask, used) => (s === -1 ? used.includes(o) : !used.includes(o)));
          expect(other, `N=${N} outline ${o} fixed ${s}`).toBeGreaterThanOrEqual(incumbent);
        });
        // a node bound with one outline forced open and another closed stays below that node's optimum
        if (p.outlines.length >= 2) {
          const node = new Int8Array(p.outlines.length);
          node[0] = 1;
          node[1] = -1;
          const nodeOpt = bestWhere(p, N, (mask, used) => used.includes(0) && (mask & 2) === 0);
          const nb = boundByLagrangian(rc, node, N, nodeOpt, 300);
          if (Number.isFinite(nodeOpt)) expect(nb.bound).toBeLessThanOrEqual(nodeOpt + 1e-6);
        }
      }
    });
  }
  it("the fixing claims above were really exercised", () => {
    expect(fixesChecked).toBeGreaterThan(10);
  });
});
