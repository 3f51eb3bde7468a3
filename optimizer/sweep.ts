/**
 * The pruned search: visit candidates in order of cost and evaluate only what could still
 * reach a front, using bounds that are proofs, never estimates.
 *
 * Why this is identical to an exhaustive search. Two staircases hold points of candidates
 * that were evaluated in full and pass: (cents, utilization units) and (cents, carbon units).
 * A candidate is left unevaluated, or its evaluation stopped early, only when
 *  - it fails: a load case exceeds 1.0 (the member fails when any case fails), or
 *    Pu > φPn,max for some case (the engine fails that case before anything else), or
 *  - it can join neither front: a known passing candidate dominates it on (cost, carbon) —
 *    both known exactly before any check — AND one dominates it on (cost, utilization) for a
 *    lower bound of its utilization. Lower bounds used: max Pu/φPn,max over the cases (the
 *    engine's case utilization is never below its axial term) and the largest case
 *    utilization evaluated so far (the member utilization is the largest case utilization).
 * A front member is dominated by no passing candidate at all, so neither test can drop it;
 * every front member is therefore evaluated in full, and the fronts selected from the fully
 * evaluated candidates equal the fronts over the whole space. The order of visiting and which
 * known points are available when (other threads) change only how much is skipped.
 *
 * No monotonicity is assumed: with the code's φ (Table 21.2.2), adding bars can lower φMn at
 * a given Pu (tension steel deepens the neutral axis and moves a section from tension-
 * controlled toward compression-controlled), so "more bars never lower capacity" is false
 * and a bisection on bar count would not be exact (optimizer/README.md has a measured case).
 *
 * Load cases are evaluated in the request's order, as checkResolved does; a case's utilization
 * does not depend on the cases evaluated before it (the engine keeps no solver state between
 * calls), so the numbers are those of the member check and of the exhaustive search.
 */
import { caseUtilization, prepareMember, resolveSection } from "../engine";
import type { LoadCase, MemberInput } from "../engine/types";
import { Staircase, toUtilUnits } from "./pareto-front";
import { proveUnstable, steelInertiaOf } from "./prove-unstable";
import { AXIAL_FAIL, sectionInputOf, type CandidateTable, type Family, type SearchProblem } from "./search-space";

/** Pass tolerance of the engine's check (utilization ≤ 1 + 1e-9 passes). */
const PASS_LIMIT = 1 + 1e-9;

/** Where known passing points come from and go to (local, or shared between threads). */
export interface BoundExchange {
  /** newly known passing points of other workers, merged into the local staircases */
  pull(util: Staircase, carbon: Staircase): void;
  /** a new passing point found here */
  push(cents: number, utilUnits: number, carbonUnits: number): void;
  /** true once the search is cancelled */
  cancelled(): boolean;
}

export interface EvaluatedCandidate {
  /** index into the candidate table */
  index: number;
  utilization: number;
  /** name of the governing load case */
  governing: string;
}

export interface RegionTally {
  /** candidates that failed, by the index of the load case that failed them */
  failedBy: number[];
  /** candidates found to pass */
  passing: number;
  /** candidates left unevaluated or stopped because they could not reach a front */
  dominated: number;
  /** candidates failed by the axial check before any evaluation */
  axialFails: number;
  /** candidates proved unstable before any evaluation (prove-unstable.ts) */
  unstableFails: number;
}

export interface SweepResult {
  /** fully evaluated passing candidates */
  passing: EvaluatedCandidate[];
  /** member evaluations over every load case */
  fullChecks: number;
  /** single load-case evaluations, all told */
  caseChecks: number;
  /** candidates visited */
  visited: number;
  /** per region key (see regionOf) */
  regions: Record<string, RegionTally>;
}

/** Region of a family for infeasibility reasons: shape and confinement. */
export function regionOf(fam: Family): string {
  return fam.shape === "rect" ? "rect" : fam.confinement === "spiral" ? "circle-spiral" : "circle";
}

function newTally(nCases: number): RegionTally {
  return { failedBy: new Array<number>(nCases).fill(0), passing: 0, dominated: 0, axialFails: 0, unstableFails: 0 };
}

export interface SweepOptions {
  /** positions [from, to) of table.visit to visit */
  from: number;
  to: number;
  exchange: BoundExchange;
  /** visit every candidate in full (the exhaustive search) */
  exhaustive?: boolean;
  /** called every few hundred candidates with the number visited since the last call */
  onTick?: (visited: number, kept: number) => void;
}

/**
 * Runs the sweep over one slice of the cost order. Pure apart from the exchange: the same
 * slice and the same known points give the same result.
 */
export function sweepSlice(problem: SearchProblem, table: CandidateTable, opts: SweepOptions): SweepResult {
  const loads = problem.loads;
  const nCases = loads.length;
  const util = new Staircase();
  const carb = new Staircase();
  const passing: EvaluatedCandidate[] = [];
  const regions: Record<string, RegionTally> = {};
  let fullChecks = 0;
  let caseChecks = 0;
  let visited = 0;
  let sinceTick = 0;
  const famTally: RegionTally[] = table.families.map((fam) => (regions[regionOf(fam)] ??= newTally(nCases)));
  const iseCache = new Map<number, [number, number]>();
  const members = problem.braceLevels.map((n): MemberInput => ({ ...problem.member, braceLevels: n }));
  const regionKeys = ["rect", "circle", "circle-spiral"];
  const regionTally = regionKeys.map((k) => (regions[k] ??= newTally(nCases)));
  const visit = table.visit;
  const exhaustive = opts.exhaustive === true;
  const ex = opts.exchange;

  /** Skip test on the points known now; counts the skip. */
  const dominated = (pos: number): boolean => {
    if (carb.dominatesAll(visit[4 * pos] as number, visit[4 * pos + 1] as number) && util.dominatesAll(visit[4 * pos] as number, visit[4 * pos + 2] as number)) {
      (regionTally[(visit[4 * pos + 3] as number) & 3] as RegionTally).dominated++;
      return true;
    }
    return false;
  };

  /** Evaluate the candidate at `pos` (stability proof, then the load cases). */
  const evaluateAt = (pos: number): void => {
    const cents = visit[4 * pos] as number;
    const cu = visit[4 * pos + 1] as number;
    const i = (visit[4 * pos + 3] as number) >>> 2;
    const famIndex = table.family[i] as number;
    const fam = table.families[famIndex] as Family;
    const tally = famTally[famIndex] as RegionTally;
    const li = table.layout[i] as number;
    const fi = table.fc[i] as number;
    const fc = (problem.fcs[fi] as { v: number }).v;
    const carbonDominated = !exhaustive && carb.dominatesAll(cents, cu);
    if (!exhaustive) {
      const key = famIndex * 65536 + li;
      let ise = iseCache.get(key);
      if (ise === undefined) iseCache.set(key, (ise = steelInertiaOf(problem, fam, li)));
      const unstable = proveUnstable(problem, fam, li, fi, problem.braceLevels[table.brace[i] as number] as number, ise);
      if (unstable >= 0) {
        tally.unstableFails++;
        tally.failedBy[unstable] = (tally.failedBy[unstable] ?? 0) + 1;
        return;
      }
    }
    const section = resolveSection(sectionInputOf(problem, { ...fam, fy: fam.fy.v }, fam.layouts[li] as [number, number], fc));
    const prep = prepareMember(section, members[table.brace[i] as number] as MemberInput, problem.options);
    let worst = -Infinity;
    let governing = -1;
    let outcome: "pass" | "fail" | "dominated" = "pass";
    for (let ci = 0; ci < nCases; ci++) {
      const u = caseUtilization(prep, loads[ci] as LoadCase);
      caseChecks++;
      if (u > worst) {
        worst = u;
        governing = ci;
      }
      if (u > PASS_LIMIT || Number.isNaN(u)) {
        if (exhaustive) {
          if (outcome === "pass") tally.failedBy[ci] = (tally.failedBy[ci] ?? 0) + 1;
          outcome = "fail";
          continue;
        }
        outcome = "fail";
        tally.failedBy[ci] = (tally.failedBy[ci] ?? 0) + 1;
        break;
      }
      if (carbonDominated && util.dominatesAll(cents, toUtilUnits(worst))) {
        outcome = "dominated";
        tally.dominated++;
        break;
      }
    }
    if (exhaustive) fullChecks++;
    if (outcome !== "pass") return;
    if (!exhaustive) fullChecks++;
    tally.passing++;
    const uu = toUtilUnits(worst);
    util.add(cents, uu);
    carb.add(cents, cu);
    ex.push(cents, uu, cu);
    passing.push({ index: i, utilization: worst, governing: (loads[governing] as LoadCase).name });
  };

  for (let pos = opts.from; pos < opts.to; pos++) {
    if ((pos - opts.from) % 32 === 0) {
      if (ex.cancelled()) break;
      ex.pull(util, carb);
    }
    visited++;
    if (opts.onTick && ++sinceTick >= 256) {
      opts.onTick(sinceTick, passing.length);
      sinceTick = 0;
    }
    if (!exhaustive) {
      // Table 22.4.2.1: the engine fails a case whose Pu exceeds φPn,max before anything else
      if ((visit[4 * pos + 2] as number) === AXIAL_FAIL) {
        (regionTally[(visit[4 * pos + 3] as number) & 3] as RegionTally).axialFails++;
        continue;
      }
      if (dominated(pos)) continue;
    }
    evaluateAt(pos);
  }
  if (opts.onTick && sinceTick > 0) opts.onTick(sinceTick, passing.length);
  return { passing, fullChecks, caseChecks, visited, regions };
}

/** An exchange for a single in-process sweep (nothing to share, never cancelled). */
export function localExchange(signal?: AbortSignal): BoundExchange {
  return { pull() {}, push() {}, cancelled: () => signal?.aborted === true };
}
