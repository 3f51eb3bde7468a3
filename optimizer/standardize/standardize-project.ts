/**
 * Project-wide standardization: at most N distinct outlines for the whole project, every mark
 * one passing candidate on one of them, least total cost (Σ quantity × cost + form sets).
 *
 * Solution path (method "auto"):
 *  1. keep each mark's cheapest candidate per outline (prepare-project.ts);
 *  2. a good outline set by greedy addition and swaps (an upper bound, improve-outline-set.ts);
 *  3. a Lagrangian lower bound; when it meets the upper bound the set is proven optimal;
 *     otherwise it fixes outlines that no better assignment can use (or avoid);
 *  4. the mixed-integer program on what is left, solved by javascript-lp-solver
 *     (solve-integer-program.ts); its open outlines are re-evaluated exactly in cents;
 *  5. should the program hit its time limit, the exact branch and bound finishes the proof.
 */
import { solveByBranchAndBound } from "./branch-and-bound";
import { evaluateOutlineSet, openSet, type OutlineSetValue } from "./evaluate-outline-set";
import { improveOutlineSet } from "./improve-outline-set";
import { boundByLagrangian, cannotBeat, fixOutlinesByBound, relaxCosts } from "./lagrangian-bound";
import { prepareProject, type PreparedProject } from "./prepare-project";
import { solveIntegerProgram } from "./solve-integer-program";
import type {
  StandardizeCandidate,
  StandardizeInput,
  StandardizeMethod,
  StandardizeOutline,
  StandardizeResult,
  StandardizeStats,
} from "./types";

export interface StandardizeSolveOptions {
  /**
   * "auto" (bounds, reduced integer program, fallback), "integer-program" (the whole integer
   * program, no reductions, no time limit) or "branch-and-bound" (the combinatorial search alone).
   */
  method?: "auto" | "integer-program" | "branch-and-bound";
  /** time limit of the integer program in "auto", ms (default 3 000; the exact branch and bound then finishes) */
  timeoutMs?: number;
  /** largest variables × constraints handed to the solver in "auto" (default MAX_TABLEAU) */
  maxTableau?: number;
  /**
   * time limit of the branch and bound, ms (default 30 000); past it the best assignment found is
   * returned with `stats.optimal: false` and the proven lower bound
   */
  branchAndBoundTimeoutMs?: number;
}

/** Outline sets worth starting from (e.g. the optimum for a smaller N). */
export interface SolveHints {
  startSets?: ReadonlyArray<readonly number[]>;
  /** the fewest outlines any assignment needs, when already known */
  minOutlines?: number | null;
}

const cents = (x: number) => x / 100;

/** The assumptions every result states. */
export function describeAssumptions<C extends StandardizeCandidate>(p: PreparedProject<C>, rotatedShareForms: boolean): string[] {
  const a = [
    "candidates are used as given: each was checked (ACI 318-19, slenderness included) by the search that produced it; standardization only chooses among them",
    "a candidate passes when its utilization is ≤ 1 and it is not flagged pass: false",
    "cost = Σ quantity × cost per column (rounded to cents per mark) + one form set per distinct outline used",
    rotatedShareForms
      ? "an outline is shape and size; a b × h and an h × b rectangle share one form set (turned a quarter turn)"
      : "an outline is shape, size and orientation; a b × h and an h × b rectangle are different form sets",
  ];
  if (p.oneFcPerLevel) a.push("every mark with a level uses the level's single f'c; marks without a level are free");
  return a;
}

function describeMark(m: { id: string; label: string }): string {
  return m.label === m.id ? `mark ${m.label}` : `mark ${m.label} (id ${m.id})`;
}

/** Reasons no N can help: marks with nothing passing, levels with no common f'c. */
export function findStructuralReasons<C extends StandardizeCandidate>(p: PreparedProject<C>, input: StandardizeInput<C>): string[] {
  const reasons: string[] = [];
  for (const mi of p.emptyMarks) {
    const m = p.marks[mi];
    if (m === undefined) continue;
    const given = input.marks[mi]?.candidates.length ?? 0;
    reasons.push(
      given === 0
        ? `${describeMark(m)} has no passing candidate (no candidates given)`
        : `${describeMark(m)} has no passing candidate (${given} given, none with utilization ≤ 1)`,
    );
  }
  if (reasons.length > 0) return reasons;
  p.levelMarks.forEach((idx, li) => {
    const sets = idx.map((mi) => new Set((p.marks[mi]?.options ?? []).map((o) => o.fc)));
    const common = [...(sets[0] ?? [])].filter((f) => sets.every((s) => s.has(f)));
    if (sets.length > 0 && common.length === 0) {
      const detail = idx
        .map((mi) => {
          const m = p.marks[mi];
          const fcs = [...new Set((m?.options ?? []).map((o) => o.fc))].sort((a, b) => a - b);
          return `${m?.label ?? "?"}: ${fcs.join(", ")}`;
        })
        .join("; ");
      reasons.push(`level ${p.levels[li] ?? "?"}: no single f'c is available to every mark on it (${detail})`);
    }
  });
  return reasons;
}

/**
 * Largest integer program (variables × constraints) handed to javascript-lp-solver in "auto";
 * about twice the whole 30-mark × 40-outline model. Larger ones go to the branch and bound.
 */
export const MAX_TABLEAU = 2_500_000;

/** The fewest distinct outlines that give every mark a passing candidate (f'c rule included). */
export function countMinimumOutlines<C extends StandardizeCandidate>(p: PreparedProject<C>, maxTableau = MAX_TABLEAU): number | null {
  const nO = p.outlines.length;
  const r = solveIntegerProgram(p, { maxOutlines: nO, objective: "count", maxTableau });
  if (!r.skipped) {
    if (!r.feasible) return null;
    // the count program may leave spare outlines open at a tie; count only those really used
    return evaluateOutlineSet(p, openSet(nO, r.open)).used.length;
  }
  // too large for the solver: the same count by the exact branch and bound, every candidate free
  // and every form set one cent
  const counting: PreparedProject<C> = {
    ...p,
    maxOutlines: nO,
    formSetCents: 1,
    marks: p.marks.map((m) => ({ ...m, options: m.options.map((o) => ({ ...o, cents: 0 })) })),
  };
  const start = improveOutlineSet(counting, nO).value;
  const bb = solveByBranchAndBound(counting, relaxCosts(counting), nO, {
    set: start.uncovered === 0 ? start.used : null,
    totalCents: start.uncovered === 0 ? start.totalCents : Number.POSITIVE_INFINITY,
  });
  return bb.set === null ? null : evaluateOutlineSet(counting, openSet(nO, bb.set)).used.length;
}

function emptyStats(method: StandardizeMethod, ms: number, p: PreparedProject<StandardizeCandidate> | null): StandardizeStats {
  return {
    method,
    ms,
    outlines: p?.outlines.length ?? 0,
    outlinesInModel: 0,
    options: p?.marks.reduce((s, m) => s + m.options.length, 0) ?? 0,
    variables: 0,
    constraints: 0,
    lowerBound: null,
    optimal: false,
    nodes: 0,
  };
}

function infeasibleResult<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  input: StandardizeInput<C>,
  reasons: string[],
  minOutlines: number | null,
  stats: StandardizeStats,
): StandardizeResult<C> {
  return {
    feasible: false,
    maxOutlines: p.maxOutlines,
    totalCost: null,
    columnsCost: null,
    formSetsCost: null,
    outlines: [],
    assignment: [],
    levelFc: [],
    reasons,
    minOutlines,
    assumptions: describeAssumptions(p, input.rotatedShareForms !== false),
    stats,
  };
}

/** Turns an exact outline-set value into the result the callers see. */
export function buildResult<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  input: StandardizeInput<C>,
  value: OutlineSetValue<C>,
  minOutlines: number | null,
  stats: StandardizeStats,
): StandardizeResult<C> {
  const ownCheapest = p.marks.map((m) => m.options[0]?.candidate.cost ?? Number.NaN);
  const assignment = p.marks.map((m) => {
    const c = value.choice[m.index];
    if (c === null || c === undefined) throw new Error(`internal: mark ${m.id} left unassigned`);
    const outline = p.outlines[c.outline];
    return {
      markId: m.id,
      label: m.label,
      level: m.level,
      candidateId: c.candidate.id,
      outline: outline?.key ?? "",
      fc: c.fc,
      utilization: c.candidate.utilization,
      cost: c.candidate.cost,
      quantity: m.quantity,
      extended: cents(c.cents),
      ownCheapestCost: ownCheapest[m.index] as number,
      candidate: c.candidate,
    };
  });
  const outlines: StandardizeOutline[] = value.used.map((oi) => {
    const parts = p.outlines[oi];
    const marks = p.marks.filter((m) => value.choice[m.index]?.outline === oi);
    const dims = parts?.shape === "circle" ? { D: parts.D } : { b: parts?.b, h: parts?.h };
    return {
      key: parts?.key ?? "",
      shape: parts?.shape ?? "rect",
      ...dims,
      marks: marks.map((m) => m.id),
      columns: marks.reduce((s, m) => s + m.quantity, 0),
      formSetCost: cents(p.formSetCents),
    };
  });
  outlines.sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
  const levelFc = p.levels.flatMap((level, li) => {
    const fc = value.levelFc[li];
    return fc === null || fc === undefined ? [] : [{ level, fc }];
  });
  return {
    feasible: true,
    maxOutlines: p.maxOutlines,
    totalCost: cents(value.totalCents),
    columnsCost: cents(value.columnsCents),
    formSetsCost: cents(value.formSetsCents),
    outlines,
    assignment,
    levelFc,
    reasons: [],
    minOutlines,
    assumptions: describeAssumptions(p, input.rotatedShareForms !== false),
    stats,
  };
}

/**
 * Solves a prepared project for its N (internal entry, shared with the sweep).
 */
export function solvePrepared<C extends StandardizeCandidate>(
  p: PreparedProject<C>,
  input: StandardizeInput<C>,
  options: StandardizeSolveOptions = {},
  hints: SolveHints = {},
): StandardizeResult<C> {
  const t0 = performance.now();
  const N = p.maxOutlines;
  const nO = p.outlines.length;
  const method = options.method ?? "auto";
  const elapsed = () => performance.now() - t0;
  const bbLimit = options.branchAndBoundTimeoutMs ?? 30_000;

  const structural = findStructuralReasons(p, input);
  if (structural.length > 0) return infeasibleResult(p, input, structural, null, emptyStats("none", Math.round(elapsed() * 10) / 10, p));

  // upper bound: greedy + swaps, and any given start sets
  let best = improveOutlineSet(p, N).value;
  for (const s of hints.startSets ?? []) {
    if (s.length > N) continue;
    const v = improveOutlineSet(p, N, s).value;
    if (v.uncovered < best.uncovered || (v.uncovered === best.uncovered && v.totalCents < best.totalCents)) best = v;
  }
  let minOutlines = hints.minOutlines;
  const stats = emptyStats(method === "auto" ? "integer-program" : method, 0, p);
  if (best.uncovered > 0) {
    if (minOutlines === undefined) minOutlines = countMinimumOutlines(p, options.maxTableau ?? MAX_TABLEAU);
    if (minOutlines === null || minOutlines > N) {
      const fcNote = p.oneFcPerLevel && p.levels.length > 0 ? " with one f'c per level" : "";
      const reason =
        minOutlines === null
          ? `no assignment exists${fcNote}`
          : `no assignment uses at most ${N} distinct outline${N === 1 ? "" : "s"}${fcNote}: the fewest that give every mark a passing candidate is ${minOutlines}`;
      stats.method = "none";
      stats.ms = Math.round(elapsed() * 10) / 10;
      return infeasibleResult(p, input, [reason], minOutlines, stats);
    }
  }
  const incumbentCents = () => (best.uncovered === 0 ? best.totalCents : Number.POSITIVE_INFINITY);
  const adopt = (open: readonly number[]) => {
    const v = evaluateOutlineSet(p, openSet(nO, open));
    if (v.uncovered === 0 && (best.uncovered > 0 || v.totalCents < best.totalCents)) best = v;
  };

  const rc = relaxCosts(p);
  const state = new Int8Array(nO);
  let rootBound = Number.NEGATIVE_INFINITY;
  let proven = false;

  if (method === "integer-program") {
    const ip = solveIntegerProgram(p, { maxOutlines: N });
    stats.variables = ip.variables;
    stats.constraints = ip.constraints;
    stats.outlinesInModel = nO;
    if (ip.feasible) adopt(ip.open);
    proven = true;
  } else if (method === "branch-and-bound") {
    const bb = solveByBranchAndBound(p, rc, N, { set: best.uncovered === 0 ? best.used : null, totalCents: incumbentCents() }, { timeLimitMs: bbLimit });
    if (bb.set !== null) adopt(bb.set);
    stats.nodes = bb.nodes;
    proven = bb.finished;
  } else {
    // bound and fix until nothing more is fixed
    for (let round = 0; round < 4; round++) {
      const res = boundByLagrangian(rc, state, N, incumbentCents(), 400);
      rootBound = Math.max(rootBound, res.bound);
      // the relaxed solution's outlines are often an optimal set themselves
      adopt(res.selected);
      if (cannotBeat(res.bound, incumbentCents())) {
        proven = true;
        stats.method = "bound";
        break;
      }
      if (fixOutlinesByBound(res, state, N, incumbentCents()) === 0) break;
    }
    if (!proven) {
      let inModel = 0;
      for (let o = 0; o < nO; o++) if (state[o] !== -1) inModel++;
      stats.outlinesInModel = inModel;
      const ip = solveIntegerProgram(p, { maxOutlines: N, state, timeoutMs: options.timeoutMs ?? 3_000, maxTableau: options.maxTableau ?? MAX_TABLEAU });
      stats.variables = ip.skipped ? 0 : ip.variables;
      stats.constraints = ip.skipped ? 0 : ip.constraints;
      if (ip.feasible) adopt(ip.open);
      if (ip.finished) {
        // infeasible here means no assignment beats the incumbent among the unfixed outlines
        proven = true;
      } else {
        // time limit reached, or the model too large for the dense simplex
        stats.method = "branch-and-bound";
        const bb = solveByBranchAndBound(p, rc, N, { set: best.uncovered === 0 ? best.used : null, totalCents: incumbentCents() }, { state, timeLimitMs: bbLimit });
        if (bb.set !== null) adopt(bb.set);
        stats.nodes = bb.nodes;
        proven = bb.finished;
      }
    }
  }
  stats.ms = Math.round(elapsed() * 10) / 10;
  stats.optimal = proven;
  if (best.uncovered > 0) {
    // the exact methods found nothing either: N is below the fewest outlines needed
    if (minOutlines === undefined) minOutlines = countMinimumOutlines(p, options.maxTableau ?? MAX_TABLEAU);
    const reason = `no assignment uses at most ${N} distinct outline${N === 1 ? "" : "s"}${minOutlines !== null && minOutlines !== undefined ? `: the fewest that give every mark a passing candidate is ${minOutlines}` : ""}`;
    stats.method = "none";
    return infeasibleResult(p, input, [reason], minOutlines ?? null, stats);
  }
  stats.lowerBound = proven ? cents(best.totalCents) : Number.isFinite(rootBound) ? cents(Math.ceil(rootBound - 1e-6)) : null;
  return buildResult(p, input, best, minOutlines ?? null, stats);
}

/**
 * Chooses at most `input.maxOutlines` distinct outlines for the project and one passing
 * candidate per mark on them, minimizing Σ quantity × cost + formSetCost × outlines used.
 * An impossible request is data: `feasible: false` with `reasons` naming the mark or level.
 *
 * @example
 * standardizeProject({ maxOutlines: 2, formSetCost: 1500, marks: [
 *   { id: "C1", label: "C1", quantity: 4, candidates: frontOfC1 },
 *   { id: "C2", label: "C2", quantity: 6, candidates: frontOfC2 } ] })
 * @throws RangeError on malformed input (see prepareProject)
 */
export function standardizeProject<C extends StandardizeCandidate>(
  input: StandardizeInput<C>,
  options: StandardizeSolveOptions = {},
): StandardizeResult<C> {
  return solvePrepared(prepareProject(input), input, options);
}
