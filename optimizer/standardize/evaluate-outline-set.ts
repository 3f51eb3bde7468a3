/**
 * The best assignment for a given set of open outlines, and its cost. Once the outlines are
 * fixed the rest is easy and exact: every mark free of the f'c rule takes its cheapest kept
 * candidate among them, and every level takes the f'c whose cheapest candidates cost its marks
 * the least. Outlines no mark ends up using are not charged a form set.
 */
import type { MarkOption, PreparedProject } from "./prepare-project";
import type { StandardizeCandidate } from "./types";

export interface OutlineSetValue<C extends StandardizeCandidate> {
  /** marks left without a candidate (0 for a feasible set) */
  uncovered: number;
  /** Σ quantity × cost of the chosen candidates, cents (of the covered marks) */
  columnsCents: number;
  /** form sets of the outlines actually used, cents */
  formSetsCents: number;
  totalCents: number;
  /** chosen option per mark (null when uncovered) */
  choice: Array<MarkOption<C> | null>;
  /** f'c chosen per level (null when no f'c serves every mark of the level) */
  levelFc: Array<number | null>;
  /** indices of the outlines used, ascending */
  used: number[];
}

function cheapestOpen<C extends StandardizeCandidate>(
  options: readonly MarkOption<C>[],
  open: Uint8Array,
  fc: number | null,
): MarkOption<C> | null {
  // options are sorted cheapest first, so the first open one is the mark's best
  for (const o of options) {
    if (open[o.outline] === 1 && (fc === null || o.fc === fc)) return o;
  }
  return null;
}

/** Value of the outline set `open` (open[o] = 1 when outline o may be used). */
export function evaluateOutlineSet<C extends StandardizeCandidate>(p: PreparedProject<C>, open: Uint8Array): OutlineSetValue<C> {
  const choice: Array<MarkOption<C> | null> = p.marks.map(() => null);
  let uncovered = 0;
  for (const m of p.marks) {
    if (m.levelIndex >= 0) continue;
    const c = cheapestOpen(m.options, open, null);
    choice[m.index] = c;
    if (c === null) uncovered++;
  }
  const levelFc: Array<number | null> = p.levels.map(() => null);
  p.levelMarks.forEach((idx, li) => {
    const fcs = new Set<number>();
    for (const mi of idx) for (const o of p.marks[mi]?.options ?? []) if (open[o.outline] === 1) fcs.add(o.fc);
    let best: { fc: number; miss: number; cents: number; picks: Array<MarkOption<C> | null> } | null = null;
    for (const fc of [...fcs].sort((a, b) => a - b)) {
      let miss = 0;
      let cents = 0;
      const picks = idx.map((mi) => {
        const c = cheapestOpen(p.marks[mi]?.options ?? [], open, fc);
        if (c === null) miss++;
        else cents += c.cents;
        return c;
      });
      if (best === null || miss < best.miss || (miss === best.miss && cents < best.cents)) best = { fc, miss, cents, picks };
    }
    if (best === null) {
      uncovered += idx.length;
      return;
    }
    uncovered += best.miss;
    levelFc[li] = best.miss === 0 ? best.fc : null;
    idx.forEach((mi, k) => {
      choice[mi] = best.picks[k] ?? null;
    });
  });
  let columnsCents = 0;
  const usedSet = new Set<number>();
  for (const c of choice) {
    if (c === null) continue;
    columnsCents += c.cents;
    usedSet.add(c.outline);
  }
  const used = [...usedSet].sort((a, b) => a - b);
  const formSetsCents = used.length * p.formSetCents;
  return { uncovered, columnsCents, formSetsCents, totalCents: columnsCents + formSetsCents, choice, levelFc, used };
}

/** Open-set vector of the given outline indices. */
export function openSet(size: number, outlines: Iterable<number>): Uint8Array {
  const open = new Uint8Array(size);
  for (const o of outlines) open[o] = 1;
  return open;
}

/** True when value a is better than b: fewer uncovered marks, then cheaper. */
export function isBetterValue(a: { uncovered: number; totalCents: number }, b: { uncovered: number; totalCents: number }): boolean {
  return a.uncovered < b.uncovered || (a.uncovered === b.uncovered && a.totalCents < b.totalCents);
}
