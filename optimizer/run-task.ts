/**
 * One task of a search: one part of the families (dealt round-robin), swept in order of cost
 * with the bounds shared between the parts. The worker thread calls exactly this; so do the
 * in-process search and the tests. Pure apart from the shared bounds.
 */
import { CAUTION, CODE_EDITION } from "../engine";
import type { CheckOutput } from "../engine/types";
import { parseOptimizeRequest, type OptimizeRequest } from "../lib/validation/optimize-request";
import { buildFrontEntry, checkCandidate, type FrontEntry } from "./front-entry";
import { selectFront, toCarbonUnits, toCents, toUtilUnits } from "./pareto-front";
import {
  buildCandidateTable,
  buildSearchProblem,
  candidateCostOf,
  candidateIdOf,
  enumerateFamilies,
  phiPnMaxOf,
  type CandidateTable,
  type Family,
  type SearchProblem,
} from "./search-space";
import { regionOf, sweepSlice, type RegionTally, type SweepResult } from "./sweep";
import { sharedExchange, type SharedBounds } from "./shared-bounds";

export interface SearchTask {
  /** the optimize request as sent (validated again here: the worker trusts no message) */
  request: unknown;
  part: number;
  parts: number;
  exhaustive: boolean;
  shared: SharedBounds;
}

/** A passing candidate evaluated in full (what the job stores besides the fronts). */
export interface PassingSummary {
  id: string;
  shape: "rect" | "circle";
  cost: number;
  carbon: number;
  utilization: number;
  cents: number;
  utilUnits: number;
  carbonUnits: number;
}

export interface RegionReport extends RegionTally {
  candidates: number;
  /** largest plan dimensions in the region, e.g. "36 × 36 in" */
  largest: string;
  /** the region's candidate of largest φPn,max with its check reasons (only when nothing passed here) */
  strongest: { id: string; phiPnMax: number; failing: Array<{ name: string; reason: string }> } | null;
}

export interface TaskResult {
  part: number;
  cancelled: boolean;
  /** local fronts' members with full data (the global fronts are a subset of their union) */
  entries: FrontEntry[];
  passing: PassingSummary[];
  candidates: number;
  fullChecks: number;
  caseChecks: number;
  outputChecks: number;
  visited: number;
  regions: Record<string, RegionReport>;
  /** where the task's time went, ms (diagnostics for benchmarks) */
  timings: { setup: number; table: number; sweep: number; finish: number };
}

function parse(request: unknown): OptimizeRequest {
  const r = parseOptimizeRequest(request);
  if (!r.ok) throw new TypeError(`invalid optimize request: ${r.error.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`);
  return r.value;
}

function dims(problem: SearchProblem, shape: "rect" | "circle"): string {
  const unit = problem.units === "SI" ? "mm" : "in";
  if (shape === "rect") {
    let b = 0;
    let h = 0;
    for (const r of problem.rects) {
      b = Math.max(b, r.b.disp);
      h = Math.max(h, r.h.disp);
    }
    return `${b} × ${h} ${unit}`;
  }
  let D = 0;
  for (const c of problem.circles) D = Math.max(D, c.disp);
  return `${D} ${unit} diameter`;
}

/** Runs one task (see SearchTask). */
export function runSearchTask(task: SearchTask, hooks: { onTick?: () => void; signal?: AbortSignal } = {}): TaskResult {
  const t0 = performance.now();
  const problem = buildSearchProblem(parse(task.request));
  const exchange = sharedExchange(task.shared, hooks.signal);
  const families: Family[] = enumerateFamilies(problem, { k: task.part, K: task.parts });
  const t1 = performance.now();
  const table: CandidateTable = buildCandidateTable(problem, families, { reuseBuffers: true });
  exchange.announce(table.n);
  const t2 = performance.now();
  const sweep: SweepResult = sweepSlice(problem, table, {
    from: 0,
    to: table.n,
    exchange,
    exhaustive: task.exhaustive,
    onTick: (v) => {
      exchange.tick(v);
      hooks.onTick?.();
    },
  });
  const t3 = performance.now();
  const cancelled = exchange.cancelled();
  const passing: PassingSummary[] = sweep.passing.map((e) => {
    const { cost, carbon } = candidateCostOf(problem, table, e.index);
    return {
      id: candidateIdOf(problem, table, e.index),
      shape: (table.families[table.family[e.index] as number] as { shape: "rect" | "circle" }).shape,
      cost: Math.round(cost * 100) / 100,
      carbon: Math.round(carbon * 100) / 100,
      utilization: Math.round(e.utilization * 1e4) / 1e4,
      cents: toCents(cost),
      utilUnits: toUtilUnits(e.utilization),
      carbonUnits: toCarbonUnits(carbon),
    };
  });
  // local fronts: every global front member is in its own part's local front
  const byUtil = selectFront(sweep.passing.map((e, k) => ({ id: (passing[k] as PassingSummary).id, a: (passing[k] as PassingSummary).cents, b: (passing[k] as PassingSummary).utilUnits, e })));
  const byCarbon = selectFront(sweep.passing.map((e, k) => ({ id: (passing[k] as PassingSummary).id, a: (passing[k] as PassingSummary).cents, b: (passing[k] as PassingSummary).carbonUnits, e })));
  const chosen = new Map<number, FrontEntry>();
  let outputChecks = 0;
  if (!cancelled) {
    for (const f of [...byUtil, ...byCarbon]) {
      if (chosen.has(f.e.index)) continue;
      chosen.set(f.e.index, buildFrontEntry(problem, table, f.e.index, f.e));
    }
  }
  // regions: size, and when nothing here passed or was dominated, why its strongest member fails
  const regions: Record<string, RegionReport> = {};
  const counts = new Map<string, number>();
  for (const fam of families) {
    const key = regionOf(fam);
    const n = fam.layouts.length * fam.confinementOk.filter(Boolean).length * problem.braceLevels.length;
    counts.set(key, (counts.get(key) ?? 0) + n);
  }
  for (const [key, n] of counts) {
    const tally = sweep.regions[key] ?? { failedBy: problem.loads.map(() => 0), passing: 0, dominated: 0, axialFails: 0, unstableFails: 0 };
    let strong: RegionReport["strongest"] = null;
    if (!cancelled && n > 0 && tally.passing === 0 && tally.dominated === 0) {
      let best = -1;
      let bestPhi = -Infinity;
      for (let i = 0; i < table.n; i++) {
        const fam = table.families[table.family[i] as number];
        if (fam === undefined || regionOf(fam) !== key) continue;
        // strongest: largest φPn,max, then more brace levels
        const phi = phiPnMaxOf(fam, table.layout[i] as number, (problem.fcs[table.fc[i] as number] as { v: number }).v) + (table.brace[i] as number) * 1e-6;
        if (phi > bestPhi) {
          bestPhi = phi;
          best = i;
        }
      }
      const check: CheckOutput = checkCandidate(problem, table, best);
      outputChecks++;
      strong = {
        id: candidateIdOf(problem, table, best),
        phiPnMax: bestPhi,
        failing: check.cases.filter((c) => !c.pass).map((c) => ({ name: c.name, reason: c.reasons[0] ?? "utilization exceeds 1.0" })),
      };
    }
    regions[key] = { ...tally, candidates: n, largest: dims(problem, key === "rect" ? "rect" : "circle"), strongest: strong };
  }
  return {
    part: task.part,
    cancelled,
    entries: [...chosen.values()],
    passing,
    candidates: table.n,
    fullChecks: sweep.fullChecks,
    caseChecks: sweep.caseChecks,
    outputChecks,
    visited: sweep.visited,
    regions,
    timings: { setup: t1 - t0, table: t2 - t1, sweep: t3 - t2, finish: performance.now() - t3 },
  };
}

/** The assumptions every optimize result carries. */
export function searchAssumptions(problem: SearchProblem): Record<string, unknown> {
  return {
    code: CODE_EDITION,
    ei: problem.options.ei ?? "b",
    braced: problem.member.braced,
    kx: problem.member.kx,
    ky: problem.member.ky,
    rhoMax: problem.rhoMax,
    exposure: problem.options.exposure ?? "interior",
    caution: CAUTION,
    notes: [
      "every alternative is checked with the member check (slenderness included, both axes, every load case)",
      "fronts compare cost in cents and utilization to 1e-4; exact ties are all kept (column-checks.md §7.12)",
      "carbon front compares cost in cents and carbon to 0.01 kgCO2e",
      "brace levels restrain both axes; design each brace separately (common practice 1–2 % of the column load)",
    ],
  };
}
