/**
 * The pruned search against an exhaustive search and against the engine's member check.
 * Scenarios are invented (optimizer-fixtures.ts); the checks are internal consistency: the same
 * fronts and best as evaluating every candidate, every front member passing checkMember with
 * the figures shown, and no front member dominated by any passing candidate.
 */
import { describe, expect, it } from "vitest";
import { checkMember } from "../../engine";
import type { CheckInput, SectionInput } from "../../engine/types";
import type { FrontEntry } from "../../optimizer/front-entry";
import type { OptimizeResult } from "../../optimizer/merge-results";
import { toCents, toUtilUnits } from "../../optimizer/pareto-front";
import { runSearchInProcess, SearchCancelledError } from "../../optimizer/run-search";
import {
  bracingLosesRequest,
  bracingWinsRequest,
  flexureRequest,
  infeasibleRequest,
  mixedRequest,
  swayRequest,
} from "./optimizer-fixtures";

const summary = (r: OptimizeResult) => ({
  best: r.best?.id ?? null,
  front: r.front.map((e) => `${e.id} ${e.cost} ${e.utilization}`),
  carbonFront: r.carbonFront.map((e) => `${e.id} ${e.cost} ${e.carbon}`),
});

const scenarios: Array<[string, unknown]> = [
  ["mixed rectangles and circles, ten load cases", mixedRequest],
  ["low axial load, large moments", flexureRequest],
  ["sway column, tied and spiral circles", swayRequest],
  ["slender column with cheap braces", bracingWinsRequest],
  ["short column with costly braces", bracingLosesRequest],
];

const exhaustive = new Map<string, OptimizeResult>();
const pruned = new Map<string, OptimizeResult>();
function both(name: string, request: unknown): [OptimizeResult, OptimizeResult] {
  if (!pruned.has(name)) pruned.set(name, runSearchInProcess(request));
  if (!exhaustive.has(name)) exhaustive.set(name, runSearchInProcess(request, { exhaustive: true }));
  return [pruned.get(name) as OptimizeResult, exhaustive.get(name) as OptimizeResult];
}

function checkInputOf(request: { member: object; loads: CheckInput["loads"]; prices: CheckInput["prices"]; carbon: CheckInput["carbon"]; space?: { cover?: number; rhoMax?: number; dagg?: number } }, e: FrontEntry): CheckInput {
  const section: SectionInput =
    e.shape === "rect"
      ? { shape: "rect", b: e.b, h: e.h, fc: e.fc, fy: e.fy, confinement: e.confinement, cover: request.space?.cover ?? 1.5, layout: { type: "perimeter", size: e.bars.size, nb: (e.bars.layout as { nb: number }).nb, nh: (e.bars.layout as { nh: number }).nh } }
      : { shape: "circle", D: e.D, fc: e.fc, fy: e.fy, confinement: e.confinement, cover: request.space?.cover ?? 1.5, layout: { type: "circle", size: e.bars.size, n: (e.bars.layout as { n: number }).n } };
  return {
    section,
    member: { ...(request.member as CheckInput["member"]), braceLevels: e.braceLevels },
    options: { ei: "b", rhoMax: request.space?.rhoMax ?? 0.04, dagg: request.space?.dagg ?? 0.75 },
    loads: request.loads,
    prices: request.prices,
    carbon: request.carbon,
  };
}

describe("pruned search = exhaustive search", () => {
  for (const [name, request] of scenarios) {
    it(`same best, cost-utilization front and carbon-cost front: ${name}`, () => {
      const [p, x] = both(name, request);
      expect(x.stats.passing).toBeGreaterThan(0);
      expect(summary(p)).toEqual(summary(x));
      expect(p.best).toEqual(x.best);
      expect(p.front).toEqual(x.front);
      expect(p.carbonFront).toEqual(x.carbonFront);
      expect(p.stats.candidates).toBe(x.stats.candidates);
      // the exhaustive search checks everything; the pruned one must skip most of it
      expect(x.stats.fullChecks).toBe(x.stats.candidates);
      expect(p.stats.fullChecks * 5).toBeLessThan(x.stats.fullChecks);
      expect(p.counters.caseChecks).toBeLessThan(x.counters.caseChecks);
    }, 120_000);
  }

  it("deals the families into parts that share bounds without changing the answer", () => {
    const one = runSearchInProcess(mixedRequest);
    const three = runSearchInProcess(mixedRequest, { parts: 3 });
    expect(summary(three)).toEqual(summary(one));
    expect(three.front).toEqual(one.front);
  });
});

describe("front members", () => {
  for (const [name, request] of scenarios) {
    it(`pass the engine's member check with the figures shown: ${name}`, () => {
      const [p] = both(name, request);
      const members = new Map<string, FrontEntry>();
      for (const e of [...p.front, ...p.carbonFront]) members.set(e.id, e);
      expect(members.size).toBeGreaterThan(0);
      for (const e of members.values()) {
        const out = checkMember(checkInputOf(request as Parameters<typeof checkInputOf>[0], e));
        expect(out.pass, e.id).toBe(true);
        expect(out.utilization, e.id).not.toBeNull();
        // the engine's biaxial solver warm-starts from earlier solutions, so a re-check may
        // differ in the last digits: one unit of the 1e-4 the fronts compare at most
        expect(Math.abs((out.utilization as number) - e.utilization), e.id).toBeLessThanOrEqual(1e-4);
        expect(out.governing, e.id).toBe(e.governing);
        expect(toCents(out.cost?.total as number), e.id).toBe(toCents(e.cost));
        expect(toCents(out.carbon?.total as number), e.id).toBe(toCents(e.carbon));
        expect(out.section.rho, e.id).toBeLessThanOrEqual(0.04 + 1e-9);
      }
    }, 120_000);

    it(`are dominated by no passing candidate, and dominate every other one: ${name}`, () => {
      const [p, x] = both(name, request);
      const all = x.passing.map((q) => ({ id: q.id, a: q.cents, b: q.utilUnits }));
      const front = p.front.map((e) => ({ id: e.id, a: toCents(e.cost), b: toUtilUnits(e.utilization) }));
      const dominates = (s: { a: number; b: number }, t: { a: number; b: number }) => s.a <= t.a && s.b <= t.b && (s.a < t.a || s.b < t.b);
      const dominated = front.filter((f) => all.some((q) => dominates(q, f))).map((f) => f.id);
      expect(dominated).toEqual([]);
      const onFront = new Set(front.map((f) => f.id));
      const stray = all.filter((q) => !onFront.has(q.id) && !front.some((f) => dominates(f, q))).map((q) => q.id);
      expect(stray).toEqual([]);
      // ordered by cost, then utilization, then id; the best is the first
      const sorted = [...front].sort((s, t) => s.a - t.a || s.b - t.b || (s.id < t.id ? -1 : s.id > t.id ? 1 : 0));
      expect(front.map((f) => f.id)).toEqual(sorted.map((f) => f.id));
      expect(p.best?.id).toBe(front[0]?.id);
    }, 120_000);
  }
});

describe("bracing as an alternative", () => {
  it("wins on a slender 40 ft column whose width is capped: the best is braced, its unbraced twin fails", () => {
    const [p, x] = both("slender column with cheap braces", bracingWinsRequest);
    const best = p.best as FrontEntry;
    expect(best.braceLevels).toBeGreaterThan(0);
    expect(x.best?.id).toBe(best.id);
    const twin = best.id.replace(/-b\d+$/, "-b0");
    expect(x.passing.some((q) => q.id === twin)).toBe(false);
    // and every unbraced candidate that passes costs more
    for (const q of x.passing.filter((c) => c.id.endsWith("-b0"))) expect(q.cost).toBeGreaterThan(best.cost);
  });

  it("loses on a short column with costly braces: the braced twin of the best is no stronger, only dearer", () => {
    const [p, x] = both("short column with costly braces", bracingLosesRequest);
    const best = p.best as FrontEntry;
    expect(best.braceLevels).toBe(0);
    const twin = x.passing.find((q) => q.id === best.id.replace(/-b0$/, "-b1"));
    expect(twin).toBeDefined();
    expect(twin?.cost).toBeCloseTo(best.cost + 2400, 2);
    expect(twin?.utilization).toBeGreaterThanOrEqual(best.utilization);
    expect(p.front.some((e) => e.id === twin?.id)).toBe(false);
  });
});

describe("infeasible requests", () => {
  it("return no best and a reason for every rejected region", () => {
    const r = runSearchInProcess(infeasibleRequest);
    expect(r.best).toBeNull();
    expect(r.front).toEqual([]);
    expect(r.carbonFront).toEqual([]);
    expect(r.stats.passing).toBe(0);
    expect(r.rejected.map((x) => x.region).sort()).toEqual(["circle", "rect"]);
    const rect = r.rejected.find((x) => x.region === "rect");
    expect(rect?.reason).toMatch(/^no rectangular section up to 20 × 20 in passes load case/);
    expect(rect?.reason).toContain('"1.2D+1.6L"');
    expect(rect?.reason).toMatch(/strongest candidate r20x20-f5-/);
  });

  it("name a region whose detailing limits leave no candidate", () => {
    const r = runSearchInProcess({ ...infeasibleRequest, space: { ...infeasibleRequest.space, D: [8, 10, 2] } });
    const circle = r.rejected.find((x) => x.region === "circle");
    expect(circle?.reason).toMatch(/^no circular \(tied\) candidate meets the detailing limits/);
  });
});

describe("cancellation in process", () => {
  it("stops at the abort signal with an AbortError", () => {
    const controller = new AbortController();
    let calls = 0;
    expect(() =>
      runSearchInProcess(mixedRequest, {
        signal: controller.signal,
        onProgress: () => {
          calls++;
          controller.abort();
        },
      }),
    ).toThrow(SearchCancelledError);
    expect(calls).toBeGreaterThan(0);
  });
});

describe("SI requests", () => {
  // an invented 4.2 m column in kN, kN·m, mm and MPa with A615M bars; prices per m³, kg, m²
  const siRequest = {
    units: "SI",
    member: { lu: 4200, kx: 1, ky: 1, braced: true },
    loads: [
      { name: "1.2D+1.6L", Pu: 2500, betaDns: 0.6, Mx: { M1: 100, M2: 180, curvature: "single" }, My: { M1: 20, M2: 60, curvature: "double" } },
      { name: "1.2D+1.0W+L", Pu: 1700, betaDns: 0.7, Mx: { M1: 150, M2: 260, curvature: "double" } },
    ],
    prices: { concrete: { "28": 250, "35": 265, "42": 280, "55": 320 }, steel: 2.5, formwork: 145, roundFormwork: 195, brace: 2400 },
    carbon: { concrete: { "28": 340, "35": 380, "42": 420, "55": 500 }, steel: 0.9 },
    space: { b: [300, 500, 100], h: [300, 500, 100], D: [300, 500, 100], fc: [28, 55], sizes: ["19", "25"], braceLevels: [0, 1] },
  };

  it("search in mm and MPa, name candidates in the request's numbers, and equal the exhaustive search", () => {
    const p = runSearchInProcess(siRequest);
    const x = runSearchInProcess(siRequest, { exhaustive: true });
    expect(p.best).not.toBeNull();
    expect(summary(p)).toEqual(summary(x));
    expect(p.front).toEqual(x.front);
    for (const e of p.front) expect(e.id).toMatch(/^(r[345]00x[345]00|c[345]00)-f(28|55)-y420-\d+(19|25)-/);
    // quantities in m³ / kg / m² under the contract's field names (as the check command does)
    const e = p.best as FrontEntry;
    const L = 4.2;
    const area = e.shape === "rect" ? ((e.b as number) / 1000) * ((e.h as number) / 1000) : (Math.PI * ((e.D as number) / 1000) ** 2) / 4;
    expect(e.quantities.concreteYd3).toBeCloseTo(area * L, 3);
  }, 120_000);
});
