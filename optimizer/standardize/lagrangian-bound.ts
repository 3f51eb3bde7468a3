/**
 * Lower bounds on the standardization optimum by Lagrangian relaxation of "every mark takes
 * exactly one candidate" (the classic bound for fixed-charge location problems):
 *
 *   L(λ) = Σm λm + Σ(o forced open) ρo + (the N − |forced open| most negative ρo of the free outlines)
 *   ρo   = F + Σm min(0, wmo − λm)
 *
 * with wmo the mark's cheapest cost (cents, × quantity) on outline o. L(λ) ≤ optimum for every
 * λ (weak duality); subgradient steps raise it. The f'c-per-level rule is left out, which only
 * lowers the bound, so it stays valid with that rule.
 *
 * The same numbers price a change of one outline: forcing a free outline open, or closed, moves
 * the bound by a known amount, and an outline whose forced bound reaches the best known total
 * can be fixed (no cheaper assignment can use it, or avoid it).
 */
import type { PreparedProject } from "./prepare-project";
import type { StandardizeCandidate } from "./types";

/** Each mark's cheapest cost per outline, flattened (fc rule relaxed). */
export interface RelaxedCosts {
  /** per mark: outline indices */
  outlines: Int32Array[];
  /** per mark: cents, parallel to outlines */
  cents: Float64Array[];
  /** per outline: the marks that have it, and the position in that mark's arrays */
  byOutline: Array<Array<[number, number]>>;
  formSetCents: number;
}

export function relaxCosts<C extends StandardizeCandidate>(p: PreparedProject<C>): RelaxedCosts {
  const byOutline: Array<Array<[number, number]>> = p.outlines.map(() => []);
  const outlines: Int32Array[] = [];
  const cents: Float64Array[] = [];
  for (const m of p.marks) {
    const best = new Map<number, number>();
    for (const o of m.options) {
      const prev = best.get(o.outline);
      if (prev === undefined || o.cents < prev) best.set(o.outline, o.cents);
    }
    const os = [...best.keys()].sort((a, b) => a - b);
    const oa = Int32Array.from(os);
    const ca = Float64Array.from(os.map((o) => best.get(o) as number));
    os.forEach((o, k) => byOutline[o]?.push([m.index, k]));
    outlines.push(oa);
    cents.push(ca);
  }
  return { outlines, cents, byOutline, formSetCents: p.formSetCents };
}

/** Fixed outlines of a node: 1 forced open, -1 forced closed, 0 free. */
export type OutlineState = Int8Array;

export interface LagrangianResult {
  /** the best bound found, cents (−Infinity when the node is empty of outlines; +Infinity when infeasible) */
  bound: number;
  lambda: Float64Array;
  /** ρo at the best λ (NaN for closed outlines) */
  rho: Float64Array;
  /** outlines open in the relaxed solution at the best λ (forced open ones included) */
  selected: number[];
  /** free outlines with ρ < 0 that were not selected (cardinality full), most negative first */
  unselectedNegative: number[];
}

interface Eval {
  value: number;
  rho: Float64Array;
  selected: number[];
  unselectedNegative: number[];
  /** free slots (N − forced open) */
  slots: number;
}

function evaluateLambda(rc: RelaxedCosts, state: OutlineState, maxOutlines: number, lambda: Float64Array): Eval {
  const nO = rc.byOutline.length;
  const rho = new Float64Array(nO);
  let value = 0;
  for (let m = 0; m < lambda.length; m++) value += lambda[m] as number;
  const forced: number[] = [];
  const free: number[] = [];
  for (let o = 0; o < nO; o++) {
    if (state[o] === -1) {
      rho[o] = Number.NaN;
      continue;
    }
    let r = rc.formSetCents;
    for (const [m, k] of rc.byOutline[o] as Array<[number, number]>) {
      const d = ((rc.cents[m] as Float64Array)[k] as number) - (lambda[m] as number);
      if (d < 0) r += d;
    }
    rho[o] = r;
    if (state[o] === 1) forced.push(o);
    else if (r < 0) free.push(o);
  }
  for (const o of forced) value += rho[o] as number;
  free.sort((a, b) => (rho[a] as number) - (rho[b] as number) || a - b);
  const slots = maxOutlines - forced.length;
  const take = Math.max(0, Math.min(slots, free.length));
  for (let i = 0; i < take; i++) value += rho[free[i] as number] as number;
  return { value, rho, selected: [...forced, ...free.slice(0, take)], unselectedNegative: free.slice(take), slots };
}

/**
 * Subgradient ascent on L(λ) for one node.
 *
 * @param target a value the bound cannot usefully exceed (the best known total, cents)
 * @param start λ to start from (a parent's), else each mark's cheapest cost
 */
export function boundByLagrangian(
  rc: RelaxedCosts,
  state: OutlineState,
  maxOutlines: number,
  target: number,
  iterations: number,
  start?: Float64Array,
): LagrangianResult {
  const nM = rc.outlines.length;
  let forcedOpen = 0;
  for (let o = 0; o < state.length; o++) if (state[o] === 1) forcedOpen++;
  // A mark with no outline left, or more forced outlines than allowed: no assignment at all.
  const infeasible = (): LagrangianResult => ({
    bound: Number.POSITIVE_INFINITY,
    lambda: start ?? new Float64Array(nM),
    rho: new Float64Array(state.length),
    selected: [],
    unselectedNegative: [],
  });
  if (forcedOpen > maxOutlines) return infeasible();
  for (let m = 0; m < nM; m++) {
    let any = false;
    for (const o of rc.outlines[m] as Int32Array) if (state[o] !== -1) any = true;
    if (!any) return infeasible();
  }
  const lambda = new Float64Array(nM);
  if (start !== undefined) lambda.set(start);
  else {
    for (let m = 0; m < nM; m++) {
      let min = Number.POSITIVE_INFINITY;
      (rc.cents[m] as Float64Array).forEach((c) => {
        if (c < min) min = c;
      });
      lambda[m] = min;
    }
  }
  let best = evaluateLambda(rc, state, maxOutlines, lambda);
  let bestLambda = Float64Array.from(lambda);
  let cur = best;
  let theta = 2;
  let stall = 0;
  const g = new Float64Array(nM);
  for (let it = 0; it < iterations; it++) {
    // subgradient: 1 − (number of selected outlines serving m more cheaply than λm)
    g.fill(1);
    for (const o of cur.selected) {
      for (const [m, k] of rc.byOutline[o] as Array<[number, number]>) {
        if (((rc.cents[m] as Float64Array)[k] as number) < (lambda[m] as number)) g[m] = (g[m] as number) - 1;
      }
    }
    let norm = 0;
    for (let m = 0; m < nM; m++) norm += (g[m] as number) ** 2;
    if (norm === 0) break; // λ is optimal: the relaxed solution is an assignment
    const gap = Number.isFinite(target) ? Math.max(target - cur.value, 1e-3 * Math.max(1, Math.abs(target))) : Math.max(1, Math.abs(cur.value)) * 0.1;
    const t = (theta * gap) / norm;
    for (let m = 0; m < nM; m++) lambda[m] = (lambda[m] as number) + t * (g[m] as number);
    cur = evaluateLambda(rc, state, maxOutlines, lambda);
    if (cur.value > best.value + 1e-9 * Math.max(1, Math.abs(best.value))) {
      best = cur;
      bestLambda = Float64Array.from(lambda);
      stall = 0;
    } else if (++stall >= 15) {
      theta /= 2;
      stall = 0;
      if (theta < 1e-4) break;
    }
    if (Number.isFinite(target) && best.value >= target) break;
  }
  return { bound: best.value, lambda: bestLambda, rho: best.rho, selected: best.selected, unselectedNegative: best.unselectedNegative };
}

/**
 * Safety margin for comparing a floating bound with an integer-cent total: far above the
 * rounding of a sum of a few thousand doubles (about 1e-13 relative), far below one cent for
 * any project total under a billion cents, so an exact bound still proves.
 */
export function boundSlack(x: number): number {
  return 1e-9 * Math.max(1, Math.abs(x)) + 1e-6;
}

/** True when no assignment under a node with bound `bound` can cost less than `incumbent` cents. */
export function cannotBeat(bound: number, incumbent: number): boolean {
  return Math.ceil(bound - boundSlack(bound)) >= incumbent;
}

/**
 * Fixes free outlines by the bound's prices (changes `state` in place): a free outline whose
 * forced opening lifts the bound to the incumbent is closed; a selected free outline whose
 * closing does is opened. Returns how many were fixed.
 */
export function fixOutlinesByBound(
  res: LagrangianResult,
  state: OutlineState,
  maxOutlines: number,
  incumbent: number,
): number {
  if (!Number.isFinite(incumbent) || !Number.isFinite(res.bound)) return 0;
  let forced = 0;
  for (let o = 0; o < state.length; o++) if (state[o] === 1) forced++;
  const slots = maxOutlines - forced;
  const selectedFree = res.selected.filter((o) => state[o] === 0);
  const full = selectedFree.length >= slots;
  // the least attractive selected free outline (last taken) and the best one left out
  const lastSelected = selectedFree.length > 0 ? (res.rho[selectedFree[selectedFree.length - 1] as number] as number) : 0;
  const nextBest = res.unselectedNegative.length > 0 ? (res.rho[res.unselectedNegative[0] as number] as number) : 0;
  const inSelected = new Set(selectedFree);
  let fixed = 0;
  for (let o = 0; o < state.length; o++) {
    if (state[o] !== 0) continue;
    const r = res.rho[o] as number;
    if (!inSelected.has(o)) {
      // open o as well: it takes a slot (dropping the last selected when full)
      if (slots <= 0) continue;
      const lifted = res.bound + r - (full ? lastSelected : 0);
      if (cannotBeat(lifted, incumbent)) {
        state[o] = -1;
        fixed++;
      }
    } else {
      // close o: its slot goes to the best outline left out, if any was negative
      const lifted = res.bound - r + (full ? Math.min(0, nextBest) : 0);
      if (cannotBeat(lifted, incumbent)) {
        state[o] = 1;
        fixed++;
      }
    }
  }
  return fixed;
}
