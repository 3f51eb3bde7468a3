/**
 * Joins the task results of one search into the optimize output (cli-contract.md § optimize):
 * the global fronts are selected again over every part's fully evaluated passing candidates
 * (each global front member is in its own part's local front, whose entries the parts built).
 */
import type { FrontEntry } from "./front-entry";
import { selectFront } from "./pareto-front";
import type { PassingSummary, RegionReport, TaskResult } from "./run-task";

export interface OptimizeStats {
  /** size of the enumerated space after the detailing limits */
  candidates: number;
  /** member evaluations over every load case (search); output checks of front members not included */
  fullChecks: number;
  /** passing candidates the search evaluated in full (the exhaustive search evaluates all) */
  passing: number;
  ms: number;
  threads: number;
}

export type OptimizeResult = {
  best: FrontEntry | null;
  front: FrontEntry[];
  carbonFront: FrontEntry[];
  stats: OptimizeStats;
  /** why whole regions (rectangles, tied circles, spiral circles) have no passing candidate */
  rejected: Array<{ region: string; reason: string }>;
  assumptions: Record<string, unknown>;
  /** every passing candidate evaluated in full (not printed by the CLI) */
  passing: PassingSummary[];
  /** search counters beyond the contract's stats */
  counters: { caseChecks: number; outputChecks: number; visited: number; exhaustive: boolean; cancelled: boolean };
};

const REGION_NAMES: Record<string, string> = {
  rect: "rectangular",
  circle: "circular (tied)",
  "circle-spiral": "circular (spiral)",
};

function mergeRegions(results: TaskResult[]): Map<string, RegionReport> {
  const out = new Map<string, RegionReport>();
  for (const r of results) {
    for (const [key, rep] of Object.entries(r.regions)) {
      const prev = out.get(key);
      if (prev === undefined) {
        out.set(key, { ...rep, failedBy: [...rep.failedBy] });
        continue;
      }
      prev.candidates += rep.candidates;
      prev.passing += rep.passing;
      prev.dominated += rep.dominated;
      prev.axialFails += rep.axialFails;
      prev.unstableFails += rep.unstableFails;
      rep.failedBy.forEach((n, i) => (prev.failedBy[i] = (prev.failedBy[i] ?? 0) + n));
      if (rep.strongest !== null && (prev.strongest === null || rep.strongest.phiPnMax > prev.strongest.phiPnMax)) prev.strongest = rep.strongest;
    }
  }
  return out;
}

/**
 * @param regionsInSpace the regions the request asked for (a region with no candidate at all
 *   still gets a reason)
 */
export function mergeResults(
  results: TaskResult[],
  info: { ms: number; threads: number; exhaustive: boolean; regionsInSpace: string[]; assumptions: Record<string, unknown> },
): OptimizeResult {
  const passing = results.flatMap((r) => r.passing);
  const entries = new Map<string, FrontEntry>();
  for (const r of results) for (const e of r.entries) entries.set(e.id, e);
  const pick = (ids: Array<{ id: string }>) =>
    ids.map((p) => {
      const e = entries.get(p.id);
      if (e === undefined) throw new Error(`front member ${p.id} has no entry (a part's local front must hold it)`);
      return e;
    });
  const front = pick(selectFront(passing.map((p) => ({ id: p.id, a: p.cents, b: p.utilUnits }))));
  const carbonFront = pick(selectFront(passing.map((p) => ({ id: p.id, a: p.cents, b: p.carbonUnits }))));
  const regions = mergeRegions(results);
  const rejected: Array<{ region: string; reason: string }> = [];
  for (const key of info.regionsInSpace) {
    const rep = regions.get(key);
    const name = REGION_NAMES[key] ?? key;
    if (rep === undefined || rep.candidates === 0) {
      rejected.push({
        region: key,
        reason: `no ${name} candidate meets the detailing limits in this space (ρ between 0.01 and rhoMax 10.6.1.1, bar count 10.7.3.1, clear spacing 25.2.3, cover Table 20.5.1.3.1${key === "circle-spiral" ? ", spiral 25.7.3" : ""}): widen the ranges or change the bar sizes`,
      });
      continue;
    }
    if (rep.passing > 0 || rep.dominated > 0) continue;
    const s = rep.strongest;
    const cases = s === null ? [] : s.failing;
    const caseNames = cases.map((c) => `"${c.name}"`);
    const which = caseNames.length === 0 ? "the load cases" : caseNames.length === 1 ? `load case ${caseNames[0]}` : `load cases ${caseNames.join(", ")}`;
    const why = cases[0] === undefined ? "" : `: even the strongest candidate ${s?.id} fails ${cases[0].name === undefined ? "" : `"${cases[0].name}"`} (${cases[0].reason})`;
    rejected.push({ region: key, reason: `no ${name} section up to ${rep.largest} passes ${which}${why}` });
  }
  const sum = (f: (r: TaskResult) => number) => results.reduce((a, r) => a + f(r), 0);
  return {
    best: front[0] ?? null,
    front,
    carbonFront,
    stats: {
      candidates: sum((r) => r.candidates),
      fullChecks: sum((r) => r.fullChecks),
      passing: passing.length,
      ms: Math.round(info.ms),
      threads: info.threads,
    },
    rejected,
    assumptions: info.assumptions,
    passing,
    counters: {
      caseChecks: sum((r) => r.caseChecks),
      outputChecks: sum((r) => r.outputChecks),
      visited: sum((r) => r.visited),
      exhaustive: info.exhaustive,
      cancelled: results.some((r) => r.cancelled),
    },
  };
}

/** The regions a problem's space asks for. */
export function regionsOf(shapes: string[], confinements: string[]): string[] {
  const out: string[] = [];
  if (shapes.includes("rect")) out.push("rect");
  if (shapes.includes("circle")) {
    if (confinements.includes("tied")) out.push("circle");
    if (confinements.includes("spiral")) out.push("circle-spiral");
  }
  return out;
}
