/**
 * The standardization as a mixed-integer program, solved with javascript-lp-solver:
 *
 *   min  Σm Σk w_mk x_mk + F Σo y_o
 *   s.t. Σk x_mk = 1                      every mark takes one kept candidate          (a_m)
 *        Σ(k on outline o) x_mk ≤ y_o     per mark and outline (disaggregated linking)   (l_m_o)
 *        Σo y_o ≤ N                                                                      (card)
 *        Σf z_lf = 1, Σ(k with f'c f) x_mk ≤ z_lf   one f'c per level (optional)         (zl_l, lz_m_f)
 *        y_o, z_lf ∈ {0, 1};  0 ≤ x_mk ≤ 1
 *
 * w_mk is quantity × cost in cents. Linking each mark to each outline separately (rather than
 * Σm x_mo ≤ M·y_o) keeps the relaxation tight. The "mark takes candidate" variables x are
 * 0/1 in meaning but left continuous in the model: once y and z are integral the remaining
 * problem gives each mark its cheapest open candidate, which an optimal vertex already is, so
 * branching on x could only repeat work (the assignment is re-derived exactly from y afterwards).
 */
import solver, { type Model } from "javascript-lp-solver";
import type { PreparedProject } from "./prepare-project";
import type { OutlineState } from "./lagrangian-bound";
import type { StandardizeCandidate } from "./types";

export interface IntegerProgramOptions {
  maxOutlines: number;
  /** outline fixings (-1 closed: left out of the model; 1 open) */
  state?: OutlineState;
  /** "cost" minimizes the total; "count" minimizes the number of outlines (no N limit) */
  objective?: "cost" | "count";
  /** ms before the solver gives up (its best so far is then not proven) */
  timeoutMs?: number;
  /**
   * Largest variables × constraints to hand to the solver (its simplex keeps a dense tableau, so
   * memory and pivot time grow with this product); a larger model is not solved (`skipped`).
   */
  maxTableau?: number;
}

export interface IntegerProgramResult {
  feasible: boolean;
  /** false when the time limit stopped the branch and bound, or the model was skipped */
  finished: boolean;
  /** true when the model exceeded maxTableau and was not solved */
  skipped: boolean;
  /** outlines with y = 1 */
  open: number[];
  /** the solver's objective value (cents, or a count) */
  objective: number;
  variables: number;
  constraints: number;
  ms: number;
}

type Bound = { min?: number; max?: number; equal?: number };

/** Narrows javascript-lp-solver's untyped result. */
function isSolveResult(r: unknown): r is { feasible: boolean; result: number; [k: string]: unknown } {
  return typeof r === "object" && r !== null && typeof (r as { feasible?: unknown }).feasible === "boolean";
}

export function buildIntegerProgram<C extends StandardizeCandidate>(p: PreparedProject<C>, opts: IntegerProgramOptions): Model {
  const objective = opts.objective ?? "cost";
  const state = opts.state;
  const closed = (o: number) => state !== undefined && state[o] === -1;
  const constraints: Record<string, Bound> = {};
  const variables: Record<string, Record<string, number>> = {};
  const binaries: Record<string, 1> = {};
  const yName = (o: number) => `y${o}`;

  const usedOutlines = new Set<number>();
  for (const m of p.marks) {
    constraints[`a${m.index}`] = { equal: 1 };
    m.options.forEach((opt, k) => {
      if (closed(opt.outline)) return;
      usedOutlines.add(opt.outline);
      const link = `l${m.index}_${opt.outline}`;
      constraints[link] = { max: 0 };
      const v: Record<string, number> = { cost: objective === "cost" ? opt.cents : 0, [`a${m.index}`]: 1, [link]: 1 };
      if (m.levelIndex >= 0) {
        const lz = `lz${m.index}_${String(opt.fc)}`;
        constraints[lz] = { max: 0 };
        v[lz] = 1;
      }
      variables[`x${m.index}_${k}`] = v;
    });
  }
  if (objective === "cost") constraints.card = { max: opts.maxOutlines };
  for (const o of [...usedOutlines].sort((a, b) => a - b)) {
    const v: Record<string, number> = { cost: objective === "cost" ? p.formSetCents : 1 };
    if (objective === "cost") v.card = 1;
    for (const m of p.marks) if (m.options.some((x) => x.outline === o)) v[`l${m.index}_${o}`] = -1;
    if (state !== undefined && state[o] === 1) {
      constraints[`f${o}`] = { min: 1 };
      v[`f${o}`] = 1;
    }
    variables[yName(o)] = v;
    binaries[yName(o)] = 1;
  }
  p.levelMarks.forEach((idx, li) => {
    const fcs = new Set<number>();
    for (const mi of idx) for (const o of p.marks[mi]?.options ?? []) if (!closed(o.outline)) fcs.add(o.fc);
    constraints[`zl${li}`] = { equal: 1 };
    for (const fc of [...fcs].sort((a, b) => a - b)) {
      const v: Record<string, number> = { cost: 0, [`zl${li}`]: 1 };
      for (const mi of idx) {
        const name = `lz${mi}_${String(fc)}`;
        if (constraints[name] !== undefined) v[name] = -1;
      }
      const z = `z${li}_${String(fc)}`;
      variables[z] = v;
      binaries[z] = 1;
    }
  });
  const model: Model = { optimize: "cost", opType: "min", constraints, variables, binaries };
  if (opts.timeoutMs !== undefined) model.timeout = opts.timeoutMs;
  return model;
}

/** Builds and solves the program; the open outlines are read back from y. */
export function solveIntegerProgram<C extends StandardizeCandidate>(p: PreparedProject<C>, opts: IntegerProgramOptions): IntegerProgramResult {
  const model = buildIntegerProgram(p, opts);
  const nVars = Object.keys(model.variables).length;
  const nCons = Object.keys(model.constraints).length;
  if (opts.maxTableau !== undefined && nVars * nCons > opts.maxTableau) {
    return { feasible: false, finished: false, skipped: true, open: [], objective: Number.NaN, variables: nVars, constraints: nCons, ms: 0 };
  }
  const t0 = performance.now();
  const r = solver.Solve(model);
  const ms = performance.now() - t0;
  if (!isSolveResult(r)) throw new Error("javascript-lp-solver returned no result");
  const finished = opts.timeoutMs === undefined || ms < opts.timeoutMs;
  if (!r.feasible) return { feasible: false, finished, skipped: false, open: [], objective: Number.NaN, variables: nVars, constraints: nCons, ms };
  const open: number[] = [];
  for (const name of Object.keys(model.variables)) {
    if (!name.startsWith("y")) continue;
    const v = r[name];
    if (typeof v === "number" && v > 0.5) open.push(Number(name.slice(1)));
  }
  open.sort((a, b) => a - b);
  return { feasible: true, finished, skipped: false, open, objective: r.result, variables: nVars, constraints: nCons, ms };
}
