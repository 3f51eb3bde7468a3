/**
 * The candidate space of one search: outlines, bar sizes, layouts, concrete strengths and
 * brace levels, kept only inside the detailing limits (column-checks.md §4, §7.10, §7.13).
 *
 * Candidates are stored compactly (typed arrays) because the default space holds several
 * hundred thousand of them. Quantities, cost and carbon of every candidate are computed here
 * in closed form with exactly the arithmetic of the engine's `computeQuantities`,
 * `computeCost` and `computeCarbon` (same operations in the same order, so the same bits);
 * tests/unit/optimizer-space.test.ts compares both over whole spaces, together with the
 * detailing filter against `checkDetailing`. Resolving every section through the engine would
 * cost ~40 µs each, which is most of a search's time budget.
 */
import {
  barProperties,
  checkDetailing,
  computeHookExtension,
  computeLapLength,
  computeTieCount,
  convertCarbon,
  convertLength,
  convertLoadCase,
  convertMemberInput,
  convertPrices,
  convertStress,
  lookupByStrength,
  minimumCover,
  resolveSection,
  tieSizeFor,
} from "../engine";
import type {
  BarSize,
  CarbonFactors,
  CheckOptions,
  Confinement,
  LoadCase,
  MemberInput,
  Prices,
  SectionInput,
} from "../engine/types";
import { defaultSpaceFor, type OptimizeRequest } from "../lib/validation/optimize-request";
import { formatCandidateId } from "./candidate-id";
import { sortVisitRecords } from "./sort-visit-records";
import { toCarbonUnits, toCents, toUtilUnits } from "./pareto-front";

/** A value in engine units with the number the user wrote (ids and output use the latter). */
export interface Valued {
  v: number;
  disp: number;
}

/** Everything a search needs, in engine units (kip, in, ksi), built once per request. */
export interface SearchProblem {
  units: "US" | "SI";
  member: MemberInput;
  loads: LoadCase[];
  prices: Prices;
  carbon: CarbonFactors;
  options: CheckOptions;
  shapes: Array<"rect" | "circle">;
  rects: Array<{ b: Valued; h: Valued }>;
  circles: Valued[];
  fcs: Valued[];
  fys: Valued[];
  sizes: BarSize[];
  braceLevels: number[];
  cover: number;
  rhoMax: number;
  dagg: number;
  confinements: Confinement[];
  /** architect's limit and its display value, when given */
  maxWidth: Valued | null;
  squareOnly: boolean;
  /** $/yd³ and kgCO2e/yd³ per f'c index (looked up once, as computeCost / computeCarbon do) */
  concretePrice: number[];
  concreteCarbon: number[];
}

function expandRange([lo, hi, step]: readonly [number, number, number]): number[] {
  const out: number[] = [];
  for (let i = 0; ; i++) {
    const v = Number((lo + i * step).toPrecision(12));
    if (v > hi + 1e-9 * Math.max(1, Math.abs(hi))) break;
    out.push(v);
  }
  return out;
}

function uniqueSorted(xs: number[]): number[] {
  return [...new Set(xs)].sort((a, b) => a - b);
}

/**
 * Turns a parsed request into a search problem in engine units. SI requests (mm, MPa, kN,
 * kN·m, prices per m³/kg/m²) are converted here; the numbers the user wrote are kept for ids.
 */
export function buildSearchProblem(req: OptimizeRequest): SearchProblem {
  const units = req.units ?? "US";
  const si = units === "SI";
  const len = (x: number) => (si ? convertLength(x, "US") : x);
  const str = (x: number) => (si ? convertStress(x, "US") : x);
  const sp = req.space ?? {};
  const DEFAULT_SPACE = defaultSpaceFor(req.units);
  const shapes = [...new Set(sp.shapes ?? DEFAULT_SPACE.shapes)];
  const squareOnly = sp.squareOnly === true;
  const maxWidth = sp.maxWidth === undefined ? null : { v: len(sp.maxWidth), disp: sp.maxWidth };
  const fitsWidth = (disp: number) => maxWidth === null || disp <= maxWidth.disp + 1e-9;
  const bVals = uniqueSorted(expandRange(sp.b ?? DEFAULT_SPACE.b)).filter(fitsWidth);
  const hVals = uniqueSorted(expandRange(sp.h ?? DEFAULT_SPACE.h)).filter(fitsWidth);
  const rects: Array<{ b: Valued; h: Valued }> = [];
  if (shapes.includes("rect")) {
    const seen = new Set<string>();
    const add = (b: number, h: number) => {
      const key = `${b}x${h}`;
      if (seen.has(key)) return;
      seen.add(key);
      rects.push({ b: { v: len(b), disp: b }, h: { v: len(h), disp: h } });
    };
    if (squareOnly) for (const s of bVals) add(s, s);
    else {
      // §7.13: both orientations, b × h and h × b
      for (const b of bVals) for (const h of hVals) add(b, h);
      for (const h of hVals) for (const b of bVals) add(h, b);
    }
  }
  const circles: Valued[] = shapes.includes("circle")
    ? uniqueSorted(expandRange(sp.D ?? DEFAULT_SPACE.D)).filter(fitsWidth).map((D) => ({ v: len(D), disp: D }))
    : [];
  const fcs = uniqueSorted(sp.fc ?? DEFAULT_SPACE.fc).map((fc) => ({ v: str(fc), disp: fc }));
  const fys = uniqueSorted(sp.fy ?? DEFAULT_SPACE.fy).map((fy) => ({ v: str(fy), disp: fy }));
  const sizes = [...new Set(sp.sizes ?? DEFAULT_SPACE.sizes)].sort((a, b) => barProperties(a).db - barProperties(b).db);
  const braceLevels = uniqueSorted(sp.braceLevels ?? (req.member.braced ? DEFAULT_SPACE.braceLevels : [0]));
  const confinements = [...new Set(sp.confinement ?? DEFAULT_SPACE.confinement)].sort() as Confinement[];
  const member: MemberInput = si ? convertMemberInput(req.member as MemberInput, "US") : { ...(req.member as MemberInput) };
  delete member.braceLevels;
  const loads = (req.loads as LoadCase[]).map((l) => (si ? convertLoadCase(l, "US") : { ...l }));
  const prices = si ? convertPrices(req.prices, "US") : req.prices;
  const carbon = si ? convertCarbon(req.carbon, "US") : req.carbon;
  const rhoMax = sp.rhoMax ?? DEFAULT_SPACE.rhoMax;
  const dagg = len(sp.dagg ?? DEFAULT_SPACE.dagg);
  const options: CheckOptions = { ei: req.options?.ei ?? "b", dagg, rhoMax, exposure: req.options?.exposure ?? "interior" };
  return {
    units,
    member,
    loads,
    prices,
    carbon,
    options,
    shapes: shapes as Array<"rect" | "circle">,
    rects,
    circles,
    fcs,
    fys,
    sizes,
    braceLevels,
    cover: len(sp.cover ?? DEFAULT_SPACE.cover),
    rhoMax,
    dagg,
    confinements,
    maxWidth,
    squareOnly,
    concretePrice: fcs.map((fc) => lookupByStrength(prices.concrete, fc.v, "prices.concrete")),
    concreteCarbon: fcs.map((fc) => lookupByStrength(carbon.concrete, fc.v, "carbon.concrete")),
  };
}

/** Same as the engine's layout spread: evenly spaced values lo…hi inclusive. */
function spread(lo: number, hi: number, n: number): number[] {
  if (n === 1) return [(lo + hi) / 2];
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(lo + ((hi - lo) * i) / (n - 1));
  return out;
}

/** Greedy cross-tie need of one face, as the engine's countCrossTies (25.7.2.3, §7.11). */
function faceNeed(coords: number[], db: number): number {
  const n = coords.length;
  if (n <= 2) return 0;
  const held: boolean[] = new Array<boolean>(n).fill(false);
  held[0] = true;
  held[n - 1] = true;
  const clear = (i: number, j: number) => Math.abs((coords[j] as number) - (coords[i] as number)) - (db + db) / 2;
  let need = 0;
  for (let i = 1; i < n - 1; i++) {
    if (held[i]) continue;
    const ok = held[i - 1] === true && clear(i - 1, i) <= 6 + 1e-9 && clear(i, i + 1) <= 6 + 1e-9;
    if (ok) {
      if (!held[i + 1]) {
        held[i + 1] = true;
        if (i + 1 < n - 1) need++;
      }
      i++;
    } else {
      held[i] = true;
      need++;
    }
  }
  return need;
}

/**
 * One family of sections: an outline, a bar size, fy and confinement. Its members differ by
 * layout; concrete strength and brace levels multiply them into candidates.
 */
export interface Family {
  index: number;
  shape: "rect" | "circle";
  /** engine units (in); for circles b = h = D */
  b: number;
  h: number;
  D: number;
  bDisp: number;
  hDisp: number;
  DDisp: number;
  size: BarSize;
  db: number;
  area: number;
  weightPlf: number;
  fy: Valued;
  confinement: Confinement;
  tieSize: BarSize;
  tieDb: number;
  tieWeightPlf: number;
  /** tie spacing (tied) per family; spiral pitch per f'c index (spirals) */
  tieSpacing: number;
  spiralPitch: number[];
  /** spiral rules per f'c index (true = all hold); all true for ties */
  confinementOk: boolean[];
  /** layouts inside the detailing limits: rect [nb, nh] pairs, circle [n, 0] */
  layouts: Array<[number, number]>;
  /** bar count per layout */
  counts: number[];
  /** cross-ties per tie set per layout: [alongH, alongB] */
  crossTies: Array<[number, number]>;
  /** Ast per layout, summed bar by bar as resolveSection does, in² */
  ast: number[];
}

function sumBars(area: number, count: number): number {
  let Ast = 0;
  for (let i = 0; i < count; i++) Ast += area;
  return Ast;
}

export interface Quantity {
  concreteYd3: number;
  longitudinalLb: number;
  tieLb: number;
  crossTieLb: number;
  steelLb: number;
  formFt2: number;
  round: boolean;
}

/** The detailing limits one layout must meet before it is a candidate. */
function layoutFits(problem: SearchProblem, shape: "rect" | "circle", b: number, h: number, D: number, db: number, area: number, count: number, minClear: number, confinement: Confinement): boolean {
  const Ag = shape === "rect" ? b * h : (Math.PI * D * D) / 4;
  let Ast = 0;
  for (let i = 0; i < count; i++) Ast += area;
  const rho = Ast / Ag;
  const cap = problem.rhoMax < 0.08 ? problem.rhoMax : 0.08;
  if (!(rho >= 0.01 - 1e-9) || !(rho <= cap + 1e-9)) return false; // 10.6.1.1
  if (count < (confinement === "spiral" ? 6 : 4)) return false; // 10.7.3.1
  const limit = Math.max(1.5, 1.5 * db, (4 / 3) * problem.dagg); // 25.2.3
  return minClear >= limit - 1e-9;
}

interface FaceCount {
  /** bars on the face, corners included */
  n: number;
  /** cross-ties the face needs (25.7.2.3) */
  need: number;
}

/**
 * The bar counts n ≥ 2 that fit one face whose corner bars sit at ±half (clear spacing
 * ≥ limit, 25.2.3) with their cross-tie needs, cached per half-length for one bar size;
 * the steel cap then keeps those with 2n ≤ maxCount + 2.
 */
function faceCounts(cache: Map<number, FaceCount[]>, half: number, db: number, limit: number, maxCount: number): FaceCount[] {
  let all = cache.get(half);
  if (all === undefined) {
    all = [];
    for (let n = 2; ; n++) {
      const xs = spread(-half, half, n);
      let minGap = Infinity;
      for (let i = 1; i < n; i++) minGap = Math.min(minGap, Math.abs((xs[i] as number) - (xs[i - 1] as number)));
      if (!(minGap - db >= limit - 1e-9)) break; // more bars only close the gaps further
      all.push({ n, need: faceNeed(xs, db) });
    }
    cache.set(half, all);
  }
  const cap = maxCount + 2;
  let k = 0;
  while (k < all.length && 2 * (all[k] as FaceCount).n <= cap) k++;
  return k === all.length ? all : all.slice(0, k);
}

/**
 * All families of the space with their valid layouts. Throws nothing for an empty result: an
 * empty space is reported by the search as a reason.
 */
export function enumerateFamilies(problem: SearchProblem, part: { k: number; K: number } = { k: 0, K: 1 }): Family[] {
  const families: Family[] = [];
  const cover = problem.cover;
  // The candidates are dealt to the K parts of a parallel search by fixed hashes. The front
  // crowds into the largest outlines (36 × 36 in holds ~45 % of the default space's front),
  // so families of large outlines are dealt layout by layout; dealing them whole left one
  // part with three quarters of the full checks. Smaller outlines are dealt whole, so each
  // part enumerates only its own.
  let spec = -1;
  const hash = (x: number) => (Math.imul(x, 0x9e3779b1) >>> 0) % part.K;
  const mine = (layoutIndex: number) => part.K === 1 || hash((spec + 1) * 4096 + layoutIndex + 1) === part.k;
  const maxArea = Math.max(
    ...problem.rects.map((r) => r.b.v * r.h.v),
    ...problem.circles.map((c) => (Math.PI * c.v * c.v) / 4),
    0,
  );
  /** whole family to one part (small outline), or layout by layout (large outline, -1) */
  const familyOwner = (area: number) => (part.K === 1 || area >= 0.5 * maxArea ? -1 : hash(spec + 1));
  for (const fy of problem.fys) {
    for (const size of problem.sizes) {
      const bar = barProperties(size);
      // Table 20.5.1.3.1: a cover below the exposure's minimum leaves no candidate of this size
      if (!(cover >= minimumCover(problem.options.exposure ?? "interior", bar.db) - 1e-9)) continue;
      const tieSize = tieSizeFor(size);
      const tie = barProperties(tieSize);
      const edge = cover + tie.db + bar.db / 2;
      const faceCache = new Map<number, FaceCount[]>();
      for (const { b, h } of problem.rects) {
        if (!problem.confinements.includes("tied")) break;
        spec++;
        const owner = familyOwner(b.v * h.v);
        if (owner >= 0 && owner !== part.k) continue;
        const xe = b.v / 2 - edge;
        const ye = h.v / 2 - edge;
        if (xe < 0 || ye < 0) continue;
        const layouts: Array<[number, number]> = [];
        const counts: number[] = [];
        const crossTies: Array<[number, number]> = [];
        const Ag = b.v * h.v;
        const cap = problem.rhoMax < 0.08 ? problem.rhoMax : 0.08;
        const maxCount = Math.floor((cap * Ag) / bar.area) + 2;
        const limit = Math.max(1.5, 1.5 * bar.db, (4 / 3) * problem.dagg); // 25.2.3
        // The clear spacing of a perimeter layout is the smaller of its two face spacings, so
        // the bar counts that fit each face are found once per face and then paired.
        // a face's bar counts depend on its length and the bar only: found once per face length
        const faceB = faceCounts(faceCache, xe, bar.db, limit, maxCount);
        const faceH = faceCounts(faceCache, ye, bar.db, limit, maxCount);
        let li = -1;
        for (const fb of faceB) {
          for (const fh of faceH) {
            const count = 2 * fb.n + 2 * (fh.n - 2);
            if (count > maxCount) break;
            // dealt by the place in the pairing (valid or not): each part tests only its own
            ++li;
            if (owner < 0 && !mine(li)) continue;
            if (!layoutFits(problem, "rect", b.v, h.v, 0, bar.db, bar.area, count, Infinity, "tied")) continue;
            layouts.push([fb.n, fh.n]);
            counts.push(count);
            crossTies.push([fb.need, fh.need]);
          }
        }
        if (layouts.length === 0) continue;
        const sMax = Math.min(16 * bar.db, 48 * tie.db, Math.min(b.v, h.v));
        families.push({
          index: families.length, shape: "rect", b: b.v, h: h.v, D: 0, bDisp: b.disp, hDisp: h.disp, DDisp: 0,
          size, db: bar.db, area: bar.area, weightPlf: bar.weightPlf, fy, confinement: "tied",
          tieSize, tieDb: tie.db, tieWeightPlf: tie.weightPlf, tieSpacing: Math.floor(sMax + 1e-9), spiralPitch: [],
          confinementOk: problem.fcs.map(() => true), layouts, counts, crossTies, ast: counts.map((c) => sumBars(bar.area, c)),
        });
      }
      for (const D of problem.circles) {
        const R = D.v / 2 - edge;
        if (R < 0) continue;
        for (const confinement of problem.confinements) {
          spec++;
          const owner = familyOwner((Math.PI * D.v * D.v) / 4);
          if (owner >= 0 && owner !== part.k) continue;
          const layouts: Array<[number, number]> = [];
          const counts: number[] = [];
          const Ag = (Math.PI * D.v * D.v) / 4;
          const cap = problem.rhoMax < 0.08 ? problem.rhoMax : 0.08;
          const maxCount = Math.floor((cap * Ag) / bar.area) + 2;
          let li = -1;
          for (let n = confinement === "spiral" ? 6 : 4; n <= maxCount; n++) {
            ++li;
            if (owner < 0 && !mine(li)) continue;
            // adjacent bars: the first on +y, the next at 2π/n (as the engine places them)
            const t = (2 * Math.PI) / n;
            const minClear = Math.hypot(0 - R * Math.sin(t), R * Math.cos(0) - R * Math.cos(t)) - bar.db;
            if (!layoutFits(problem, "circle", 0, 0, D.v, bar.db, bar.area, n, minClear, confinement)) continue;
            layouts.push([n, 0]);
            counts.push(n);
          }
          if (layouts.length === 0) continue;
          const spiralPitch: number[] = [];
          const confinementOk: boolean[] = [];
          for (const fc of problem.fcs) {
            if (confinement === "tied") {
              confinementOk.push(true);
              continue;
            }
            // the spiral rules depend on D, the spiral bar, f'c and fy, not on the bar count
            const sec = resolveSection(sectionInputOf(problem, { shape: "circle", D: D.v, size, fy: fy.v, confinement }, layouts[0] as [number, number], fc.v));
            spiralPitch.push(sec.tie.spacing);
            const rules = checkDetailing(sec, problem.options).rules.filter((r) => r.rule.startsWith("spiral"));
            confinementOk.push(rules.every((r) => r.ok));
          }
          const sMax = Math.min(16 * bar.db, 48 * tie.db, D.v);
          families.push({
            index: families.length, shape: "circle", b: D.v, h: D.v, D: D.v, bDisp: D.disp, hDisp: D.disp, DDisp: D.disp,
            size, db: bar.db, area: bar.area, weightPlf: bar.weightPlf, fy, confinement,
            tieSize, tieDb: tie.db, tieWeightPlf: tie.weightPlf, tieSpacing: Math.floor(sMax + 1e-9), spiralPitch,
            confinementOk, layouts, counts, crossTies: layouts.map(() => [0, 0]), ast: counts.map((c) => sumBars(bar.area, c)),
          });
        }
      }
    }
  }
  return families;
}

/** The engine's section input of one family member. */
export function sectionInputOf(
  problem: SearchProblem,
  fam: { shape: "rect" | "circle"; b?: number; h?: number; D?: number; size: BarSize; fy: number; confinement: Confinement },
  layout: [number, number],
  fc: number,
): SectionInput {
  if (fam.shape === "rect") {
    return {
      shape: "rect", b: fam.b, h: fam.h, fc, fy: fam.fy, confinement: fam.confinement, cover: problem.cover,
      layout: { type: "perimeter", size: fam.size, nb: layout[0], nh: layout[1] },
    };
  }
  return {
    shape: "circle", D: fam.D, fc, fy: fam.fy, confinement: fam.confinement, cover: problem.cover,
    layout: { type: "circle", size: fam.size, n: layout[0] },
  };
}

/** Quantities of one candidate, bit for bit as computeQuantities (column-checks.md §6). */
export function quantitiesOf(problem: SearchProblem, fam: Family, layoutIndex: number, fcIndex: number): Quantity {
  const member = problem.member;
  const L = member.pourHeight ?? member.lu;
  const Ag = fam.shape === "rect" ? fam.b * fam.h : (Math.PI * fam.D * fam.D) / 4;
  const fc = (problem.fcs[fcIndex] as Valued).v;
  const count = fam.counts[layoutIndex] as number;
  const lp = computeLapLength(fam.fy.v, fam.db, fc);
  const perBar = ((L + lp) / 12) * fam.weightPlf;
  let longitudinalLb = 0;
  for (let i = 0; i < count; i++) longitudinalLb += perBar;
  const dt = fam.tieDb;
  const hook135 = computeHookExtension(dt);
  let tieLb: number;
  let crossTieLb = 0;
  if (fam.shape === "circle" && fam.confinement === "spiral") {
    const d = fam.D - 2 * problem.cover - dt;
    const s = fam.spiralPitch[fcIndex] as number;
    const turns = L / s + 3;
    const hoopLength = turns * Math.hypot(Math.PI * d, s);
    tieLb = (hoopLength / 12) * fam.tieWeightPlf;
  } else {
    const ties = computeTieCount(L, fam.tieSpacing);
    let hoopLength: number;
    if (fam.shape === "circle") {
      hoopLength = Math.PI * (fam.D - 2 * problem.cover - dt) + 2 * hook135;
    } else {
      const bc = fam.b - 2 * problem.cover - dt;
      const hc = fam.h - 2 * problem.cover - dt;
      hoopLength = 2 * (bc + hc) + 2 * hook135;
      const hook90 = 6 * dt;
      const lenH = hc + hook135 + hook90;
      const lenB = bc + hook135 + hook90;
      const [alongH, alongB] = fam.crossTies[layoutIndex] as [number, number];
      crossTieLb = ((ties * (alongH * lenH + alongB * lenB)) / 12) * fam.tieWeightPlf;
    }
    tieLb = ((ties * hoopLength) / 12) * fam.tieWeightPlf;
  }
  const perimeter = fam.shape === "circle" ? Math.PI * fam.D : 2 * (fam.b + fam.h);
  return {
    concreteYd3: (Ag * L) / 46656,
    longitudinalLb,
    tieLb,
    crossTieLb,
    steelLb: longitudinalLb + tieLb + crossTieLb,
    formFt2: (perimeter * L) / 144,
    round: fam.shape === "circle",
  };
}

/** Cost total as computeCost sums it (line by line, in the same order). */
export function costOf(problem: SearchProblem, q: Quantity, fcIndex: number, braceLevels: number): number {
  const p = problem.prices;
  let total = 0;
  total += q.concreteYd3 * (problem.concretePrice[fcIndex] as number);
  total += q.longitudinalLb * p.steel;
  total += q.tieLb * p.steel;
  if (q.crossTieLb > 0) total += q.crossTieLb * p.steel;
  total += q.formFt2 * (q.round ? p.roundFormwork : p.formwork);
  if (braceLevels > 0) total += braceLevels * p.brace;
  return total;
}

/** Carbon total as computeCarbon gives it, kgCO2e. */
export function carbonOf(problem: SearchProblem, q: Quantity, fcIndex: number): number {
  const concrete = q.concreteYd3 * (problem.concreteCarbon[fcIndex] as number);
  const steel = q.steelLb * problem.carbon.steel;
  return concrete + steel;
}

/** φPn,max of a candidate, kip, with resolveSection's arithmetic (Table 22.4.2.1). */
export function phiPnMaxOf(fam: Family, layoutIndex: number, fc: number): number {
  const Ag = fam.shape === "rect" ? fam.b * fam.h : (Math.PI * fam.D * fam.D) / 4;
  const Ast = fam.ast[layoutIndex] as number;
  const P0 = 0.85 * fc * (Ag - Ast) + fam.fy.v * Ast;
  const PnMax = (fam.confinement === "spiral" ? 0.85 : 0.8) * P0;
  return (fam.confinement === "spiral" ? 0.75 : 0.65) * PnMax;
}

/**
 * The whole candidate list: one entry per (family, layout, f'c, brace level), in compact
 * arrays; cost and carbon in cents and 0.01 kgCO2e ride in the visit records (exact values
 * of any one candidate: candidateCostOf).
 */
export interface CandidateTable {
  families: Family[];
  n: number;
  family: Uint32Array;
  layout: Uint16Array;
  fc: Uint8Array;
  brace: Uint8Array;
  /**
   * What the sweep reads, in visiting order (cents, then index): 4 unsigned 32-bit integers
   * per position — cents, carbon units, the axial lower bound of the utilization in 1e-4
   * units (AXIAL_FAIL when some Pu exceeds φPn,max), and index × 4 + region. 16 bytes a
   * candidate, read in one stream (memory traffic, not arithmetic, limits two threads here).
   */
  visit: Uint32Array;
}

/** Lower-bound slot of a candidate some load case fails by Pu > φPn,max (Table 22.4.2.1). */
export const AXIAL_FAIL = 0xffffffff;

/** Largest cents or carbon units a visit record holds ($42 million, 42 900 t CO2e per column). */
const MAX_UNITS = 0xfffffffe;

/** Region index of a family in `visit` (0 rect, 1 tied circle, 2 spiral circle). */
export function regionIndexOf(fam: Family): number {
  return fam.shape === "rect" ? 0 : fam.confinement === "spiral" ? 2 : 1;
}

/**
 * Typed arrays kept between the tasks a worker thread runs: allocating tens of MB afresh for
 * every search costs more in page faults than filling them, and those faults do not run in
 * parallel on two threads. Only used when the caller owns the table until its next call.
 */
const reusable = new Map<string, Float64Array | Uint32Array | Uint16Array | Uint8Array>();
function arrayOf<T extends Float64Array | Uint32Array | Uint16Array | Uint8Array>(
  name: string,
  n: number,
  make: (n: number) => T,
  reuse: boolean,
): T {
  if (!reuse) return make(n);
  let a = reusable.get(name) as T | undefined;
  if (a === undefined || a.length < n) {
    a = make(Math.ceil(n * 1.25));
    reusable.set(name, a);
  }
  return a.subarray(0, n) as T;
}

export function buildCandidateTable(
  problem: SearchProblem,
  families: Family[] = enumerateFamilies(problem),
  options: { reuseBuffers?: boolean } = {},
): CandidateTable {
  const reuse = options.reuseBuffers === true;
  let n = 0;
  for (const fam of families) {
    const fcOk = fam.confinementOk.filter(Boolean).length;
    n += fam.layouts.length * fcOk * problem.braceLevels.length;
  }
  // the visit record's tag holds index × 4 + region in 32 bits
  if (n >= 2 ** 30) throw new RangeError(`the space holds ${n} candidates; the search ranks at most 2^30 at once`);
  const t: CandidateTable = {
    families,
    n,
    family: arrayOf("family", n, (m) => new Uint32Array(m), reuse),
    layout: arrayOf("layout", n, (m) => new Uint16Array(m), reuse),
    fc: arrayOf("fc", n, (m) => new Uint8Array(m), reuse),
    brace: arrayOf("brace", n, (m) => new Uint8Array(m), reuse),
    visit: arrayOf("visit", 4 * n, (m) => new Uint32Array(m), reuse),
  };
  // visit records in index order: cents, carbon units, lower bound, index × 4 + region
  const recs = t.visit;
  let maxCents = 0;
  const maxPu = problem.loads.reduce((m, l) => Math.max(m, l.Pu), -Infinity);
  let k = 0;
  for (const fam of families) {
    const region = regionIndexOf(fam);
    const laps = problem.fcs.map((fc) => computeLapLength(fam.fy.v, fam.db, fc.v));
    for (let li = 0; li < fam.layouts.length; li++) {
      let q: Quantity | null = null;
      for (let fi = 0; fi < problem.fcs.length; fi++) {
        if (!fam.confinementOk[fi]) continue;
        // quantities depend on f'c only through the lap (25.5.5.1) and the spiral pitch
        if (q === null || fam.confinement === "spiral" || laps[fi] !== laps[fi - 1]) q = quantitiesOf(problem, fam, li, fi);
        const carbon = carbonOf(problem, q, fi);
        // the engine fails a case with Pu > φPn,max first; a case's utilization is ≥ Pu/φPn,max
        const phiPnMax = phiPnMaxOf(fam, li, (problem.fcs[fi] as Valued).v);
        const lbUnits = maxPu <= phiPnMax ? toUtilUnits(maxPu / phiPnMax) : AXIAL_FAIL;
        const base = costOf(problem, q, fi, 0);
        for (let bi = 0; bi < problem.braceLevels.length; bi++) {
          const n = problem.braceLevels[bi] as number;
          const cost = withBraces(problem, base, n);
          t.family[k] = fam.index;
          t.layout[k] = li;
          t.fc[k] = fi;
          t.brace[k] = bi;
          const cents = toCents(cost);
          const carbonUnits = toCarbonUnits(carbon);
          if (cents > maxCents) maxCents = cents;
          if (!(cents >= 0 && cents <= MAX_UNITS && carbonUnits >= 0 && carbonUnits <= MAX_UNITS)) {
            throw new RangeError(`a candidate's cost ($${cost}) or carbon (${carbon} kgCO2e) is outside what the search can rank (0 … 42 million)`);
          }
          recs[4 * k] = cents;
          recs[4 * k + 1] = carbonUnits;
          recs[4 * k + 2] = lbUnits;
          recs[4 * k + 3] = 4 * k + region;
          k++;
        }
      }
    }
  }
  // Visit order: by cents, ties by index (the radix sort is stable and the records were
  // written in index order).
  t.visit = sortVisitRecords(recs, arrayOf("visitSpare", 4 * n, (m) => new Uint32Array(m), reuse), n, maxCents);
  return t;
}

/**
 * Cost ($) and carbon (kgCO2e) of candidate i, with the same arithmetic as the table's cents
 * and carbon units (recomputed for the few candidates reported, instead of stored for all).
 */
export function candidateCostOf(problem: SearchProblem, t: CandidateTable, i: number): { cost: number; carbon: number } {
  const fam = t.families[t.family[i] as number] as Family;
  const li = t.layout[i] as number;
  const fi = t.fc[i] as number;
  const n = problem.braceLevels[t.brace[i] as number] as number;
  const q = quantitiesOf(problem, fam, li, fi);
  return { cost: withBraces(problem, costOf(problem, q, fi, 0), n), carbon: carbonOf(problem, q, fi) };
}

/**
 * The cost with n brace levels from the cost without any: computeCost adds the brace line
 * last, so the total is total₀ + n·price, bit for bit (the table and candidateCostOf share it).
 */
function withBraces(problem: SearchProblem, base: number, n: number): number {
  return n > 0 ? base + n * problem.prices.brace : base;
}

/** The contract id of candidate i. */
export function candidateIdOf(problem: SearchProblem, t: CandidateTable, i: number): string {
  const fam = t.families[t.family[i] as number] as Family;
  const [a, b] = fam.layouts[t.layout[i] as number] as [number, number];
  const fc = (problem.fcs[t.fc[i] as number] as Valued).disp;
  const braceLevels = problem.braceLevels[t.brace[i] as number] as number;
  if (fam.shape === "rect") {
    return formatCandidateId({ shape: "rect", b: fam.bDisp, h: fam.hDisp, fc, fy: fam.fy.disp, size: fam.size, nb: a, nh: b, braceLevels });
  }
  return formatCandidateId({ shape: "circle", D: fam.DDisp, fc, fy: fam.fy.disp, size: fam.size, n: a, confinement: fam.confinement, braceLevels });
}
