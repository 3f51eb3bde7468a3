/**
 * Project-wide standardization: the integer program (and every other path) against a brute-force
 * enumeration of all outline subsets on small invented projects, plus the properties the optimum
 * must have. The brute force below is written from the problem statement alone: for every subset S
 * of outlines, each mark takes its cheapest passing candidate on S (with one f'c per level, each
 * level takes its cheapest common f'c), cost = Σ quantity × cost (cents per mark) + F·|S|.
 */
import { describe, expect, it } from "vitest";
import { standardizeProject, sweepOutlines, type StandardizeCandidate, type StandardizeInput, type StandardizeResult } from "../../optimizer/standardize";
import type { FrontEntry } from "../../optimizer/front-entry";
import { inventProject } from "../../optimizer/standardize/invent-project";
import { prepareProject } from "../../optimizer/standardize/prepare-project";
import { countMinimumOutlines } from "../../optimizer/standardize/standardize-project";

type Method = "auto" | "integer-program" | "branch-and-bound";
const METHODS: Method[] = ["auto", "integer-program", "branch-and-bound"];

function keyOf(c: StandardizeCandidate, rotated = true): string {
  if (c.shape === "circle") return `c${c.D}`;
  const b = c.b as number;
  const h = c.h as number;
  return rotated ? `r${Math.min(b, h)}x${Math.max(b, h)}` : `r${b}x${h}`;
}

const passes = (c: StandardizeCandidate) => c.pass !== false && c.utilization <= 1;

/** Best total (cents) for every subset size k = 0 … maxK, by enumerating all subsets. */
function bruteForceBySize(input: StandardizeInput, maxK: number): number[] {
  const rotated = input.rotatedShareForms !== false;
  const keys = [...new Set(input.marks.flatMap((m) => m.candidates.filter(passes).map((c) => keyOf(c, rotated))))].sort();
  const F = Math.round(input.formSetCost * 100);
  const fcRule = input.oneFcPerLevel === true;
  const best: number[] = Array.from({ length: maxK + 1 }, () => Number.POSITIVE_INFINITY);
  const cheapest = (m: StandardizeInput["marks"][number], S: Set<string>, fc: number | null) => {
    let min = Number.POSITIVE_INFINITY;
    for (const c of m.candidates) {
      if (!passes(c) || !S.has(keyOf(c, rotated)) || (fc !== null && c.fc !== fc)) continue;
      min = Math.min(min, Math.round(c.cost * m.quantity * 100));
    }
    return min;
  };
  const n = keys.length;
  for (let mask = 0; mask < 1 << n; mask++) {
    const S = new Set(keys.filter((_, i) => mask & (1 << i)));
    if (S.size > maxK) continue;
    let total = F * S.size;
    const levels = new Map<string, StandardizeInput["marks"][number][]>();
    for (const m of input.marks) {
      if (fcRule && m.level !== undefined) {
        levels.set(m.level, [...(levels.get(m.level) ?? []), m]);
        continue;
      }
      total += cheapest(m, S, null);
    }
    for (const ms of levels.values()) {
      const fcs = [...new Set(ms.flatMap((m) => m.candidates.map((c) => c.fc)))];
      let lv = Number.POSITIVE_INFINITY;
      for (const fc of fcs) lv = Math.min(lv, ms.reduce((s, m) => s + cheapest(m, S, fc), 0));
      total += lv;
    }
    if (total < (best[S.size] as number)) best[S.size] = total;
  }
  return best;
}

/** Optimum for "at most N" from the per-size optima. */
function bruteForceAtMost(bySize: number[], N: number): number {
  return Math.min(...bySize.slice(0, N + 1));
}

/** Everything a returned assignment must satisfy, whatever the optimum. */
function expectConsistent(input: StandardizeInput, r: StandardizeResult): void {
  expect(r.feasible).toBe(true);
  expect(r.assignment.map((a) => a.markId)).toEqual(input.marks.map((m) => m.id));
  expect(r.outlines.length).toBeLessThanOrEqual(input.maxOutlines);
  const keys = new Set(r.outlines.map((o) => o.key));
  let columnsCents = 0;
  input.marks.forEach((m, i) => {
    const a = r.assignment[i];
    if (a === undefined) throw new Error("missing assignment");
    const c = m.candidates.find((x) => x.id === a.candidateId);
    expect(c).toBeDefined();
    if (c === undefined) return;
    expect(passes(c)).toBe(true);
    expect(keys.has(keyOf(c, input.rotatedShareForms !== false))).toBe(true);
    expect(a.outline).toBe(keyOf(c, input.rotatedShareForms !== false));
    expect(a.extended).toBeCloseTo(Math.round(c.cost * m.quantity * 100) / 100, 6);
    columnsCents += Math.round(c.cost * m.quantity * 100);
  });
  // every listed outline is used by at least one mark
  for (const o of r.outlines) expect(o.marks.length).toBeGreaterThan(0);
  expect(Math.round((r.columnsCost ?? 0) * 100)).toBe(columnsCents);
  expect(Math.round((r.formSetsCost ?? 0) * 100)).toBe(Math.round(input.formSetCost * 100) * r.outlines.length);
  expect(Math.round((r.totalCost ?? 0) * 100)).toBe(columnsCents + Math.round(input.formSetCost * 100) * r.outlines.length);
  if (input.oneFcPerLevel === true) {
    const byLevel = new Map<string, Set<number>>();
    for (const a of r.assignment) if (a.level !== null) byLevel.set(a.level, (byLevel.get(a.level) ?? new Set()).add(a.fc));
    for (const s of byLevel.values()) expect(s.size).toBe(1);
  }
}

const small = (seed: number, extra: Partial<Parameters<typeof inventProject>[0]> = {}) =>
  inventProject({ seed, marks: 4 + (seed % 3), outlinesPerMark: 5, sizes: [12, 14, 16, 18, 20], variants: 2, ...extra });

describe("standardizeProject equals brute force on small projects", () => {
  for (let seed = 1; seed <= 10; seed++) {
    for (const formSetCost of [0, 800, 6000]) {
      it(`seed ${seed}, form set ${formSetCost}`, () => {
        const base = { ...small(seed), formSetCost };
        const nMarks = base.marks.length;
        const bySize = bruteForceBySize({ ...base, maxOutlines: nMarks }, nMarks);
        for (let N = 1; N <= nMarks; N++) {
          const input = { ...base, maxOutlines: N };
          const expected = bruteForceAtMost(bySize, N);
          for (const method of METHODS) {
            const r = standardizeProject(input, { method });
            if (!Number.isFinite(expected)) {
              expect(r.feasible, `${method} N=${N}`).toBe(false);
              expect(r.minOutlines).toBe(bySize.findIndex((v) => Number.isFinite(v)));
              continue;
            }
            expect(r.feasible, `${method} N=${N}`).toBe(true);
            expect(Math.round((r.totalCost ?? 0) * 100), `${method} N=${N}`).toBe(expected);
            expect(r.stats.optimal).toBe(true);
            expectConsistent(input, r);
          }
        }
      });
    }
  }
});

describe("one f'c per level", () => {
  for (let seed = 21; seed <= 28; seed++) {
    it(`equals brute force, seed ${seed}`, () => {
      const base = { ...small(seed, { levels: 2, variants: 3 }), formSetCost: 900, oneFcPerLevel: true };
      const nMarks = base.marks.length;
      const bySize = bruteForceBySize({ ...base, maxOutlines: nMarks }, nMarks);
      for (let N = 1; N <= nMarks; N++) {
        const input = { ...base, maxOutlines: N };
        const expected = bruteForceAtMost(bySize, N);
        for (const method of METHODS) {
          const r = standardizeProject(input, { method });
          if (!Number.isFinite(expected)) {
            expect(r.feasible, `${method} N=${N}`).toBe(false);
            continue;
          }
          expect(Math.round((r.totalCost ?? 0) * 100), `${method} N=${N}`).toBe(expected);
          expectConsistent(input, r);
          expect(r.levelFc.map((l) => l.level).sort()).toEqual(["L1", "L2"]);
        }
      }
    });
  }

  // A and B on one level: A has 12×12 at 4 ksi and 14×14 at 5 ksi, B the reverse.
  const cand = (id: string, b: number, fc: number, cost: number): StandardizeCandidate => ({ id, shape: "rect", b, h: b, fc, cost, utilization: 0.9 });
  const crossed: StandardizeInput = {
    maxOutlines: 1,
    formSetCost: 100,
    marks: [
      { id: "A", label: "A", level: "L1", quantity: 2, candidates: [cand("a12", 12, 4, 500), cand("a14", 14, 5, 520)] },
      { id: "B", label: "B", level: "L1", quantity: 1, candidates: [cand("b14", 14, 4, 610), cand("b12", 12, 5, 600)] },
    ],
  };

  it("one outline suffices without the rule", () => {
    const r = standardizeProject(crossed);
    expect(r.feasible).toBe(true);
    // r12x12 for both: 2 × 500 + 600 + one form set 100
    expect(r.totalCost).toBe(1700);
  });

  it("with the rule one outline is too few, and the reason says how many are needed", () => {
    const r = standardizeProject({ ...crossed, oneFcPerLevel: true });
    expect(r.feasible).toBe(false);
    expect(r.minOutlines).toBe(2);
    expect(r.reasons.join(" ")).toMatch(/at most 1 distinct outline with one f'c per level: the fewest .* is 2/);
    const two = standardizeProject({ ...crossed, oneFcPerLevel: true, maxOutlines: 2 });
    // f'c 4 for the level: A a12 (2 × 500) + B b14 (610) + two form sets; f'c 5 would cost 2 × 520 + 600 + 200
    expect(two.totalCost).toBe(1810);
    expect(two.levelFc).toEqual([{ level: "L1", fc: 4 }]);
  });

  it("a level with no common f'c is named", () => {
    const r = standardizeProject({
      ...crossed,
      oneFcPerLevel: true,
      maxOutlines: 2,
      marks: [
        { id: "A", label: "A", level: "L7", quantity: 1, candidates: [cand("a12", 12, 4, 500)] },
        { id: "B", label: "B", level: "L7", quantity: 1, candidates: [cand("b12", 12, 5, 500)] },
      ],
    });
    expect(r.feasible).toBe(false);
    expect(r.reasons).toEqual(["level L7: no single f'c is available to every mark on it (A: 4; B: 5)"]);
  });

  it("marks without a level are free of the rule", () => {
    const marks = crossed.marks.map((m) => ({ ...m, level: undefined }));
    const r = standardizeProject({ ...crossed, marks, oneFcPerLevel: true });
    expect(r.totalCost).toBe(1700);
  });
});

describe("properties of the optimum", () => {
  it("N = number of marks with no form-set cost gives every mark its own cheapest candidate", () => {
    for (const seed of [3, 4, 5]) {
      const input = { ...inventProject({ seed, marks: 12, outlinesPerMark: 10 }), formSetCost: 0 };
      const r = standardizeProject({ ...input, maxOutlines: input.marks.length });
      expect(r.feasible).toBe(true);
      input.marks.forEach((m, i) => {
        const own = [...m.candidates].filter(passes).sort((a, b) => a.cost - b.cost || a.utilization - b.utilization || (a.id < b.id ? -1 : 1))[0];
        expect(r.assignment[i]?.candidateId).toBe(own?.id);
        expect(r.assignment[i]?.cost).toBe(r.assignment[i]?.ownCheapestCost);
      });
    }
  });

  it("an exact bound proves at once: no form-set cost and N = marks settles at the root of the branch and bound", () => {
    const input = { ...inventProject({ seed: 1, marks: 30, outlinesPerMark: 40 }), formSetCost: 0, maxOutlines: 30 };
    const r = standardizeProject(input, { method: "branch-and-bound", branchAndBoundTimeoutMs: 5000 });
    expect(r.stats.optimal).toBe(true);
    expect(r.stats.nodes).toBe(1);
    const own = input.marks.reduce((sum, m) => sum + Math.min(...m.candidates.filter(passes).map((c) => Math.round(c.cost * m.quantity * 100))), 0);
    expect(Math.round((r.totalCost ?? 0) * 100)).toBe(own);
  });

  it("total cost never rises as N grows, and the sweep agrees with single solves", () => {
    for (const seed of [6, 7]) {
      for (const formSetCost of [0, 2500]) {
        const input = { ...inventProject({ seed, marks: 10, outlinesPerMark: 12 }), formSetCost };
        const sweep = sweepOutlines(input);
        expect(sweep.map((r) => r.maxOutlines)).toEqual(Array.from({ length: 10 }, (_, i) => i + 1));
        let last = Number.POSITIVE_INFINITY;
        let feasibleSeen = false;
        for (const r of sweep) {
          if (feasibleSeen) expect(r.feasible).toBe(true);
          if (!r.feasible) continue;
          feasibleSeen = true;
          expect(r.totalCost as number).toBeLessThanOrEqual(last);
          last = r.totalCost as number;
        }
        expect(feasibleSeen).toBe(true);
        for (const N of [2, 4, 10]) {
          const single = standardizeProject({ ...input, maxOutlines: N }, { method: "branch-and-bound" });
          expect(sweep[N - 1]?.totalCost).toBe(single.totalCost);
        }
      }
    }
  });

  it("when the integer program hits its time limit the exact fallback finishes with the same optimum", () => {
    const input = { ...inventProject({ seed: 31, marks: 20, outlinesPerMark: 25, formSetCost: 20000 }), maxOutlines: 4 };
    const reference = standardizeProject(input, { method: "integer-program" });
    const r = standardizeProject(input, { timeoutMs: 0.001 });
    // this project is not settled by the bounds alone (60 outlines remain for the program)
    expect(r.stats.method).toBe("branch-and-bound");
    expect(r.stats.nodes).toBeGreaterThan(0);
    expect(r.stats.optimal).toBe(true);
    expect(r.totalCost).toBe(reference.totalCost);
  });

  it("a model too large for the solver goes to the exact branch and bound, with the same optimum and count", () => {
    const input = { ...inventProject({ seed: 32, marks: 20, outlinesPerMark: 25, formSetCost: 3000 }), maxOutlines: 3 };
    const reference = standardizeProject(input, { method: "integer-program" });
    const r = standardizeProject(input, { maxTableau: 0 });
    expect(["branch-and-bound", "bound"]).toContain(r.stats.method);
    expect(r.stats.variables).toBe(0);
    expect(r.totalCost).toBe(reference.totalCost);
    const narrow = inventProject({ seed: 2, marks: 20, outlinesPerMark: 8, formSetCost: 5000, sizes: Array.from({ length: 18 }, (_, i) => 12 + 2 * i) });
    const p = prepareProject({ ...narrow, maxOutlines: 1 });
    const byProgram = countMinimumOutlines(p);
    expect(byProgram).toBeGreaterThan(1);
    expect(countMinimumOutlines(p, 0)).toBe(byProgram);
    const tooFew = standardizeProject({ ...narrow, maxOutlines: (byProgram as number) - 1 }, { maxTableau: 0 });
    expect(tooFew.feasible).toBe(false);
    expect(tooFew.minOutlines).toBe(byProgram);
    expect(standardizeProject({ ...narrow, maxOutlines: byProgram as number }, { maxTableau: 0 }).feasible).toBe(true);
  });

  it("30 marks × 40 outlines: the reduced integer program and the branch and bound agree", () => {
    const input = inventProject({ seed: 30, marks: 30, outlinesPerMark: 40, formSetCost: 20000 });
    for (const N of [2, 3, 6]) {
      const a = standardizeProject({ ...input, maxOutlines: N });
      const b = standardizeProject({ ...input, maxOutlines: N }, { method: "branch-and-bound" });
      expect(a.feasible).toBe(b.feasible);
      expect(a.totalCost).toBe(b.totalCost);
      if (a.feasible) expectConsistent({ ...input, maxOutlines: N }, a);
    }
  });
});

describe("outlines", () => {
  const rot = (b: number, h: number, id: string): StandardizeCandidate => ({ id, shape: "rect", b, h, fc: 5, cost: 1000, utilization: 0.8 });
  const input: StandardizeInput = {
    maxOutlines: 1,
    formSetCost: 500,
    marks: [
      { id: "C1", label: "C1", quantity: 3, candidates: [rot(18, 22, "r18x22-f5-y60-10#8-p3x4-b0")] },
      { id: "C2", label: "C2", quantity: 2, candidates: [rot(22, 18, "r22x18-f5-y60-10#8-p4x3-b0")] },
    ],
  };

  it("an 18×22 and a 22×18 share one form set by default (keyed smaller side first)", () => {
    const r = standardizeProject(input);
    expect(r.feasible).toBe(true);
    expect(r.outlines.map((o) => [o.key, o.b, o.h, o.columns])).toEqual([["r18x22", 18, 22, 5]]);
    expect(r.totalCost).toBe(5 * 1000 + 500);
  });

  it("with rotatedShareForms false they are two outlines", () => {
    const r = standardizeProject({ ...input, rotatedShareForms: false });
    expect(r.feasible).toBe(false);
    expect(r.minOutlines).toBe(2);
    const two = standardizeProject({ ...input, rotatedShareForms: false, maxOutlines: 2 });
    expect(two.outlines.map((o) => o.key)).toEqual(["r18x22", "r22x18"]);
  });

  it("keeps the cheapest candidate per outline and skips failing ones", () => {
    const r = standardizeProject({
      maxOutlines: 1,
      formSetCost: 0,
      marks: [
        {
          id: "C1",
          label: "C1",
          quantity: 1,
          candidates: [
            { id: "cheap-but-failing", shape: "rect", b: 16, h: 16, fc: 5, cost: 300, utilization: 1.02 },
            { id: "flagged-failing", shape: "rect", b: 16, h: 16, fc: 5, cost: 310, utilization: 0.9, pass: false },
            { id: "dear", shape: "rect", b: 16, h: 16, fc: 5, cost: 450, utilization: 0.7 },
            { id: "cheap", shape: "rect", b: 16, h: 16, fc: 6, cost: 420, utilization: 0.75 },
          ],
        },
      ],
    });
    expect(r.assignment[0]?.candidateId).toBe("cheap");
  });

  it("accepts optimize front entries as they are and carries them through", () => {
    // typed as the optimizer's own front entry, so a change there that breaks this shows at typecheck
    const front: FrontEntry[] = [
      {
        id: "r18x22-f5-y60-8#8-p3x3-b0", shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied",
        bars: { size: "#8", count: 8, layout: { type: "perimeter", nb: 3, nh: 3 } }, braceLevels: 0, cost: 1234.56, carbon: 800,
        costBreakdown: { concrete: 600, steel: 400, formwork: 234.56, bracing: 0 }, quantities: { concreteYd3: 2.1, steelLb: 300, formFt2: 60 },
        utilization: 0.97, governing: "1.2D+1.6L", rho: 0.016,
      },
    ];
    const r = standardizeProject({ maxOutlines: 1, formSetCost: 0, marks: [{ id: "C9", label: "C9", quantity: 2, candidates: front }] });
    expect(r.assignment[0]?.candidate.bars.count).toBe(8);
    expect(r.assignment[0]?.extended).toBe(2469.12);
  });
});

describe("infeasible and invalid input", () => {
  const ok: StandardizeCandidate = { id: "r16x16-a", shape: "rect", b: 16, h: 16, fc: 5, cost: 700, utilization: 0.9 };
  it("names every mark with no passing candidate", () => {
    const r = standardizeProject({
      maxOutlines: 3,
      formSetCost: 0,
      marks: [
        { id: "m1", label: "C1", quantity: 1, candidates: [ok] },
        { id: "m2", label: "C2", quantity: 1, candidates: [] },
        { id: "m3", label: "C3", quantity: 1, candidates: [{ ...ok, id: "r16x16-b", utilization: 1.3 }] },
      ],
    });
    expect(r.feasible).toBe(false);
    expect(r.totalCost).toBeNull();
    expect(r.assignment).toEqual([]);
    expect(r.reasons).toEqual([
      "mark C2 (id m2) has no passing candidate (no candidates given)",
      "mark C3 (id m3) has no passing candidate (1 given, none with utilization ≤ 1)",
    ]);
    // the sweep gives the same answer for every N
    const sweep = sweepOutlines({
      formSetCost: 0,
      marks: [
        { id: "m1", label: "C1", quantity: 1, candidates: [ok] },
        { id: "m2", label: "C2", quantity: 1, candidates: [] },
      ],
    });
    expect(sweep.map((s) => s.feasible)).toEqual([false, false]);
    expect(sweep[1]?.reasons[0]).toMatch(/C2/);
  });

  it("N below the fewest outlines needed is infeasible with that number", () => {
    const c = (id: string, b: number): StandardizeCandidate => ({ ...ok, id, b, h: b });
    const r = standardizeProject({
      maxOutlines: 2,
      formSetCost: 0,
      marks: [
        { id: "A", label: "A", quantity: 1, candidates: [c("a", 12)] },
        { id: "B", label: "B", quantity: 1, candidates: [c("b", 14)] },
        { id: "C", label: "C", quantity: 1, candidates: [c("c", 16), c("c2", 14)] },
        { id: "D", label: "D", quantity: 1, candidates: [c("d", 18)] },
      ],
    });
    expect(r.feasible).toBe(false);
    expect(r.minOutlines).toBe(3);
    expect(r.reasons).toEqual(["no assignment uses at most 2 distinct outlines: the fewest that give every mark a passing candidate is 3"]);
  });

  it("rejects malformed input with RangeError", () => {
    const mark = { id: "A", label: "A", quantity: 1, candidates: [ok] };
    expect(() => standardizeProject({ maxOutlines: 1, formSetCost: 0, marks: [] })).toThrow(RangeError);
    expect(() => standardizeProject({ maxOutlines: 0, formSetCost: 0, marks: [mark] })).toThrow(/maxOutlines/);
    expect(() => standardizeProject({ maxOutlines: 1, formSetCost: -1, marks: [mark] })).toThrow(/formSetCost/);
    expect(() => standardizeProject({ maxOutlines: 1, formSetCost: 0, marks: [mark, mark] })).toThrow(/appears twice/);
    expect(() => standardizeProject({ maxOutlines: 1, formSetCost: 0, marks: [{ ...mark, quantity: 1.5 }] })).toThrow(/quantity/);
    expect(() => standardizeProject({ maxOutlines: 1, formSetCost: 0, marks: [{ ...mark, candidates: [{ ...ok, b: undefined }] }] })).toThrow(/b must be/);
  });
});
