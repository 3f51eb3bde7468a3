/**
 * The candidate space against the engine it stands in for: the closed-form detailing filter
 * must keep exactly the layouts checkDetailing accepts, and quantities, cost, carbon and
 * φPn,max must be bit for bit what computeQuantities, computeCost, computeCarbon and
 * resolveSection give (the fronts compare cents, so "close" is not enough).
 */
import { describe, expect, it } from "vitest";
import {
  caseUtilization,
  checkDetailing,
  computeCarbon,
  computeCost,
  computeQuantities,
  countCrossTies,
  prepareMember,
  resolveSection,
} from "../../engine";
import type { LoadCase, SectionInput } from "../../engine/types";
import { proveUnstable, steelInertiaOf } from "../../optimizer/prove-unstable";
import { parseOptimizeRequest } from "../../lib/validation/optimize-request";
import { formatCandidateId, parseCandidateId } from "../../optimizer/candidate-id";
import { sortVisitRecords } from "../../optimizer/sort-visit-records";
import { toCarbonUnits, toCents } from "../../optimizer/pareto-front";
import {
  buildCandidateTable,
  buildSearchProblem,
  candidateCostOf,
  candidateIdOf,
  carbonOf,
  costOf,
  enumerateFamilies,
  phiPnMaxOf,
  quantitiesOf,
  sectionInputOf,
  type SearchProblem,
} from "../../optimizer/search-space";
import { carbon, prices, tenCases } from "./optimizer-fixtures";

function problemOf(space: Record<string, unknown>, extra: Record<string, unknown> = {}): SearchProblem {
  const r = parseOptimizeRequest({ member: { lu: 276, kx: 1, ky: 1, braced: true }, loads: tenCases, prices, carbon, space, ...extra });
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return buildSearchProblem(r.value);
}

describe("detailing filter = engine checkDetailing", () => {
  for (const [label, space] of [
    ["ρmax 0.04, fy 60 and 75", { b: [12, 24, 3], h: [12, 24, 3], D: [12, 24, 3], fc: [4, 8], fy: [60, 75], sizes: ["#6", "#9", "#11"], confinement: ["tied", "spiral"] }],
    ["ρmax 0.08, cover 2 in, dagg 1 in", { b: [12, 20, 4], h: [14, 22, 4], D: [14, 22, 4], fc: [5], rhoMax: 0.08, cover: 2, dagg: 1, sizes: ["#8", "#10", "#11"], confinement: ["tied", "spiral"] }],
  ] as const) {
    it(`keeps exactly the layouts the engine accepts (${label})`, () => {
      const problem = problemOf(space as Record<string, unknown>);
      const families = enumerateFamilies(problem);
      const kept = new Set<string>();
      for (const f of families) for (const [a, b] of f.layouts) kept.add(`${f.shape}|${f.b}|${f.h}|${f.size}|${f.fy.v}|${f.confinement}|${a}|${b}`);
      let accepted = 0;
      let tried = 0;
      for (const fy of problem.fys) {
        for (const size of problem.sizes) {
          const shapes: Array<{ shape: "rect" | "circle"; b: number; h: number; conf: "tied" | "spiral" }> = [
            ...(problem.confinements.includes("tied") ? problem.rects.map((r) => ({ shape: "rect" as const, b: r.b.v, h: r.h.v, conf: "tied" as const })) : []),
            ...problem.circles.flatMap((c) => problem.confinements.map((conf) => ({ shape: "circle" as const, b: c.v, h: c.v, conf }))),
          ];
          for (const s of shapes) {
            const pairs: Array<[number, number]> = [];
            if (s.shape === "rect") for (let nb = 2; nb <= 12; nb++) for (let nh = 2; nh <= 12; nh++) pairs.push([nb, nh]);
            else for (let n = 3; n <= 30; n++) pairs.push([n, 0]);
            for (const pair of pairs) {
              const fam = { shape: s.shape, b: s.b, h: s.h, D: s.b, size, fy: fy.v, confinement: s.conf };
              for (let fi = 0; fi < problem.fcs.length; fi++) {
                const input: SectionInput = sectionInputOf(problem, fam, pair, (problem.fcs[fi] as { v: number }).v);
                let ok = false;
                try {
                  ok = checkDetailing(resolveSection(input), problem.options).rules.every((r) => r.ok);
                } catch {
                  ok = false; // the layout does not fit inside the cover
                }
                tried++;
                const key = `${s.shape}|${s.b}|${s.h}|${size}|${fy.v}|${s.conf}|${pair[0]}|${pair[1]}`;
                const family = families.find((f) => f.shape === s.shape && f.b === s.b && f.h === s.h && f.size === size && f.fy.v === fy.v && f.confinement === s.conf);
                const inSpace = kept.has(key) && family !== undefined && family.confinementOk[fi] === true;
                expect(inSpace, `${key} f'c index ${fi}`).toBe(ok);
                if (ok) accepted++;
              }
            }
          }
        }
      }
      expect(accepted).toBeGreaterThan(100);
      expect(tried).toBeGreaterThan(accepted);
    }, 120_000);
  }
});

describe("quantities, cost, carbon and φPn,max = the engine's, bit for bit", () => {
  it("over a whole space, every brace level", () => {
    const problem = problemOf(
      { b: [12, 30, 6], h: [12, 30, 6], D: [14, 30, 8], fc: [4, 8], fy: [60, 75], sizes: ["#6", "#8", "#11"], confinement: ["tied", "spiral"] },
      { member: { lu: 250, kx: 1, ky: 1, braced: true, pourHeight: 262 } },
    );
    const table = buildCandidateTable(problem);
    expect(table.n).toBeGreaterThan(2000);
    for (let i = 0; i < table.n; i++) {
      const fam = table.families[table.family[i] as number];
      if (fam === undefined) throw new Error("family");
      const li = table.layout[i] as number;
      const fi = table.fc[i] as number;
      const fc = (problem.fcs[fi] as { v: number }).v;
      const n = problem.braceLevels[table.brace[i] as number] as number;
      const sec = resolveSection(sectionInputOf(problem, { ...fam, fy: fam.fy.v }, fam.layouts[li] as [number, number], fc));
      const q = computeQuantities(sec, problem.member, countCrossTies(sec));
      const mine = quantitiesOf(problem, fam, li, fi);
      expect(mine.concreteYd3).toBe(q.concreteYd3);
      expect(mine.longitudinalLb).toBe(q.longitudinalLb);
      expect(mine.tieLb).toBe(q.tieLb);
      expect(mine.crossTieLb).toBe(q.crossTieLb);
      expect(mine.steelLb).toBe(q.steelLb);
      expect(mine.formFt2).toBe(q.formFt2);
      const cost = computeCost(q, fc, n, problem.prices).total;
      expect(candidateCostOf(problem, table, i).cost).toBe(cost);
      expect(costOf(problem, mine, fi, n)).toBe(cost);
      expect(candidateCostOf(problem, table, i).carbon).toBe(computeCarbon(q, fc, problem.carbon).total);
      expect(carbonOf(problem, mine, fi)).toBe(computeCarbon(q, fc, problem.carbon).total);
      expect(phiPnMaxOf(fam, li, fc)).toBe(sec.phiPnMax);
    }
  }, 120_000);
});

describe("the space a request describes", () => {
  it("takes both orientations of unequal ranges, and the architect's limits narrow it", () => {
    const p = problemOf({ shapes: ["rect"], b: [12, 16, 4], h: [20, 24, 4] });
    expect(p.rects.map((r) => `${r.b.disp}x${r.h.disp}`).sort()).toEqual(
      ["12x20", "12x24", "16x20", "16x24", "20x12", "24x12", "20x16", "24x16"].sort(),
    );
    const narrow = problemOf({ shapes: ["rect", "circle"], b: [12, 30, 6], h: [12, 30, 6], D: [12, 30, 6], maxWidth: 24 });
    expect(Math.max(...narrow.rects.map((r) => Math.max(r.b.disp, r.h.disp)))).toBe(24);
    expect(Math.max(...narrow.circles.map((c) => c.disp))).toBe(24);
    const square = problemOf({ shapes: ["rect"], b: [12, 30, 6], h: [12, 30, 6], squareOnly: true });
    expect(square.rects.every((r) => r.b.disp === r.h.disp)).toBe(true);
    expect(square.rects).toHaveLength(4);
  });

  it("defaults to the documented space (rect and circles 12–36 in step 2, f'c 4/5/6/8, #6–#11, 0–2 braces)", () => {
    const p = problemOf({});
    expect(p.rects).toHaveLength(13 * 13);
    expect(p.circles.map((c) => c.disp)).toEqual([12, 14, 16, 18, 20, 22, 24, 26, 28, 30, 32, 34, 36]);
    expect(p.fcs.map((f) => f.disp)).toEqual([4, 5, 6, 8]);
    expect(p.sizes).toEqual(["#6", "#7", "#8", "#9", "#10", "#11"]);
    expect(p.braceLevels).toEqual([0, 1, 2]);
    expect(p.rhoMax).toBe(0.04);
  });

  it("gives every candidate a contract id that reads back to its parts", () => {
    const p = problemOf({ b: [16, 20, 4], h: [16, 20, 4], D: [16, 20, 4], fc: [4.5, 8], sizes: ["#8"], braceLevels: [0, 2], confinement: ["tied", "spiral"] }, { prices: { ...prices, concrete: { ...prices.concrete, "4.5": 195 } }, carbon: { ...carbon, concrete: { ...carbon.concrete, "4.5": 275 } } });
    const t = buildCandidateTable(p);
    const ids = new Set<string>();
    for (let i = 0; i < t.n; i++) {
      const id = candidateIdOf(p, t, i);
      ids.add(id);
      const parts = parseCandidateId(id);
      expect(parts, id).not.toBeNull();
      expect(formatCandidateId(parts as NonNullable<typeof parts>)).toBe(id);
    }
    expect(ids.size).toBe(t.n);
    expect([...ids].some((id) => /^c\d+-f4\.5-y60-\d+#8-s-b2$/.test(id))).toBe(true);
  });
});

describe("dealing the space to the parts of a parallel search", () => {
  it("gives every candidate to exactly one of K parts, and the parts are balanced", () => {
    const p = problemOf({ b: [12, 36, 4], h: [12, 36, 4], D: [16, 28, 4], confinement: ["tied", "spiral"] });
    const idsOf = (part?: { k: number; K: number }) => {
      const t = buildCandidateTable(p, enumerateFamilies(p, part));
      return Array.from({ length: t.n }, (_, i) => candidateIdOf(p, t, i));
    };
    const all = idsOf();
    for (const K of [2, 3]) {
      const parts = Array.from({ length: K }, (_, k) => idsOf({ k, K }));
      const union = parts.flat();
      expect(new Set(union).size).toBe(union.length); // disjoint
      expect([...union].sort()).toEqual([...all].sort()); // complete
      // dealt layout by layout: each part holds a share of the largest outline's layouts (the
      // low-utilization end of the front crowds there), not all or nothing of it
      const largest = (ids: string[]) => ids.filter((id) => id.startsWith("r36x36-") && id.includes("#8-")).length;
      for (const ids of parts) expect(largest(ids)).toBeGreaterThan((0.6 * largest(all)) / K);
    }
  });

  it("visits candidates by cents, ties by index, as a comparison sort would", () => {
    const p = problemOf({ b: [12, 24, 4], h: [12, 24, 4], D: [16, 24, 4] });
    const t = buildCandidateTable(p);
    const cents = Array.from({ length: t.n }, (_, i) => toCents(candidateCostOf(p, t, i).cost));
    const expected = Array.from({ length: t.n }, (_, i) => i).sort((a, b) => (cents[a] as number) - (cents[b] as number) || a - b);
    expect(Array.from({ length: t.n }, (_, pos) => (t.visit[4 * pos + 3] as number) >>> 2)).toEqual(expected);
    for (let pos = 0; pos < t.n; pos++) {
      const i = (t.visit[4 * pos + 3] as number) >>> 2;
      expect(t.visit[4 * pos]).toBe(cents[i]);
      expect(t.visit[4 * pos + 1]).toBe(toCarbonUnits(candidateCostOf(p, t, i).carbon));
    }
  });
});

describe("sortVisitRecords (radix sort of the visit records)", () => {
  it("is stable and agrees with a comparison sort over keys spanning several digits", () => {
    let seed = 7;
    const rand = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 2 ** 32);
    for (const maxKey of [0, 5, 2047, 2048, 5_000_000, 2 ** 32 - 1]) {
      const n = 3000;
      const a = new Uint32Array(4 * n);
      for (let i = 0; i < n; i++) {
        a[4 * i] = Math.floor(rand() * (maxKey + 1));
        a[4 * i + 1] = i; // original position: shows stability
        a[4 * i + 2] = 3 * i;
        a[4 * i + 3] = 4 * i + 1;
      }
      const rows = Array.from({ length: n }, (_, i) => [a[4 * i], a[4 * i + 1], a[4 * i + 2], a[4 * i + 3]] as number[]);
      rows.sort((x, y) => (x[0] as number) - (y[0] as number) || (x[1] as number) - (y[1] as number));
      const sorted = sortVisitRecords(a, new Uint32Array(4 * n), n, maxKey);
      expect(Array.from(sorted)).toEqual(rows.flat());
    }
  });

  it("refuses keys it cannot sort", () => {
    expect(() => sortVisitRecords(new Uint32Array(4), new Uint32Array(4), 1, 2 ** 32)).toThrow(RangeError);
    expect(() => sortVisitRecords(new Uint32Array(4), new Uint32Array(4), 1, -1)).toThrow(RangeError);
  });
});

describe("candidate ids", () => {
  it("spell the contract's example exactly", () => {
    expect(formatCandidateId({ shape: "rect", b: 18, h: 22, fc: 5, fy: 60, size: "#8", nb: 3, nh: 3, braceLevels: 0 })).toBe("r18x22-f5-y60-8#8-p3x3-b0");
    expect(formatCandidateId({ shape: "circle", D: 24, fc: 6, fy: 60, size: "#9", n: 8, confinement: "spiral", braceLevels: 1 })).toBe("c24-f6-y60-8#9-s-b1");
    expect(formatCandidateId({ shape: "circle", D: 24, fc: 6, fy: 60, size: "#9", n: 8, confinement: "tied", braceLevels: 0 })).toBe("c24-f6-y60-8#9-t-b0");
    expect(parseCandidateId("r18x22-f5-y60-9#8-p3x3-b0")).toBeNull(); // count disagrees with nb × nh
    expect(parseCandidateId("x")).toBeNull();
  });
});

describe("proof of a failing load case without the engine", () => {
  for (const [label, member, ei] of [
    ["EI option (b), 23 ft, k = 1", { lu: 276, kx: 1, ky: 1, braced: true }, "b"],
    ["EI option (a), weak-axis strut ℓuy", { lu: 300, luy: 200, kx: 1.2, ky: 0.9, braced: true }, "a"],
  ] as const) {
    it(`only ever proves a failure (instability or the 1.4 cap) the engine also finds (${label})`, () => {
      const problem = problemOf(
        { b: [12, 24, 4], h: [12, 24, 4], D: [12, 24, 4], fc: [4, 8], sizes: ["#6", "#9"], braceLevels: [0, 1, 2], confinement: ["tied", "spiral"] },
        { member, options: { ei } },
      );
      const table = buildCandidateTable(problem);
      let proved = 0;
      for (let i = 0; i < table.n; i++) {
        const fam = table.families[table.family[i] as number];
        if (fam === undefined) throw new Error("family");
        const li = table.layout[i] as number;
        const fi = table.fc[i] as number;
        const n = problem.braceLevels[table.brace[i] as number] as number;
        const which = proveUnstable(problem, fam, li, fi, n, steelInertiaOf(problem, fam, li));
        const sec = resolveSection(sectionInputOf(problem, { ...fam, fy: fam.fy.v }, fam.layouts[li] as [number, number], (problem.fcs[fi] as { v: number }).v));
        const prep = prepareMember(sec, { ...problem.member, braceLevels: n }, problem.options);
        if (which >= 0) {
          proved++;
          expect(caseUtilization(prep, problem.loads[which] as LoadCase), `${candidateIdOf(problem, table, i)} case ${which}`).toBe(Infinity);
        }
      }
      expect(proved).toBeGreaterThan(100);
    }, 120_000);
  }
});
