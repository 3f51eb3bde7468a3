/**
 * Strain-compatibility kernel shared by every interaction routine (internal).
 *
 * Model (ACI 318-19): plane sections; εcu = 0.003 at the extreme compression fibre
 * (22.2.2.1); Whitney block 0.85 f'c over a = β1 c, a ≤ the section depth in that
 * direction (22.2.2.4.1); bars elastic–perfectly plastic with Es = 29 000 ksi (20.2.2);
 * a bar whose centre lies inside the block (depth d < a) carries fs − 0.85 f'c
 * (displaced concrete). Compression and compressive strain are positive in forces.
 *
 * Direction convention: the neutral-axis angle α gives the unit vector pointing to the
 * compression side, u = (sin α, cos α). α = 0 compresses the +y face (moment about x,
 * Mx > 0); α = π/2 compresses the +x face (My > 0). Moments are about the centroidal
 * axes: Mx = Σ F·y, My = Σ F·x.
 *
 * Per-section arrays and per-direction scans are cached on the ResolvedSection object
 * (non-enumerable symbol property), which is therefore treated as immutable once used.
 */
import { EPS_CU } from "../materials";
import { rotateSection } from "../section/rotate-section";
import { segmentInto } from "../section/measure-circular-segment";
import { rectangleBlockInto } from "../section/clip-rectangle-block";
import type { ResolvedSection } from "../types";
import { phiOf } from "./phi-factor";

/** φ for tension-controlled sections and pure tension (Table 21.2.2). */
export const PHI_TENSION = 0.9;

/** One neutral-axis direction with bar depths precomputed. */
export interface Direction {
  ux: number;
  uy: number;
  /** coordinate of the extreme compression fibre along u, in */
  tmax: number;
  /** section depth in this direction, in */
  depth: number;
  /** depth of each bar below the extreme compression fibre, in */
  d: number[];
  /** depth of the extreme tension bar, in */
  dt: number;
  /** c at which the block first covers the whole depth */
  cFull: number;
  /** smallest c at which Pn = P0 (block full and every bar yielded in compression) */
  cP0: number;
  /**
   * Bars at the same depth strain alike, so evaluate() sums them as one layer: layer depth,
   * area, Σ A·y and Σ A·x. Uniaxial directions group the bars (a 4 × 4 perimeter has 4
   * layers); any other direction keeps one layer per bar.
   */
  nl: number;
  ld: number[];
  lA: number[];
  lAy: number[];
  lAx: number[];
}

/**
 * Values of φPn at grid neutral-axis depths for one direction; grid points at the
 * displaced-concrete steps carry separate left/right values so each interval
 * (cR[k], cL[k+1]) is continuous.
 */
export interface Scan {
  dir: Direction;
  m: number;
  cL: number[];
  cR: number[];
  vL: number[];
  vR: number[];
}

export interface Kernel {
  section: ResolvedSection;
  n: number;
  bx: number[];
  by: number[];
  ba: number[];
  /** area × y and area × x of each bar (the per-bar layers of an arbitrary direction) */
  bay: number[];
  bax: number[];
  circle: boolean;
  halfB: number;
  halfH: number;
  R: number;
  beta1: number;
  fy: number;
  es: number;
  /** 0.85 f'c, ksi */
  k85: number;
  epsTy: number;
  /** φ for compression-controlled sections: 0.65 tied / 0.75 spiral */
  phiC: number;
  P0: number;
  phiPnMax: number;
  Pnt: number;
  /** mirror y → −y maps the bars onto themselves (both senses of Mx are equal) */
  symAboutX: boolean;
  /** mirror x → −x maps the bars onto themselves (both senses of My are equal) */
  symAboutY: boolean;
  /** uniaxial directions 0: α = 0 (+Mx), 1: α = π/2 (+My), 2: α = π (−Mx), 3: α = 3π/2 (−My) */
  uni: (Direction | undefined)[];
  scans: (Scan | undefined)[];
  halfPitch?: ResolvedSection;
  /** Igx/Igy: tan α / tan θ of the elastic neutral axis, the first guess of every biaxial call */
  elasticTanRatio: number;
  /** reusable direction for arbitrary angles */
  scratchDir: Direction;
}

/**
 * The kernel is kept on the section itself under a non-enumerable symbol: invisible to
 * JSON, spreading and equality checks, and cheaper for the garbage collector than a
 * WeakMap when a search creates many short-lived sections.
 */
const KERNEL = Symbol("caryatid.interactionKernel");
type WithKernel = ResolvedSection & { [KERNEL]?: Kernel };
/** fallback for frozen sections, which cannot take the property */
const frozenCache = new WeakMap<ResolvedSection, Kernel>();

function isMirrored(bx: number[], by: number[], ba: number[], sx: number, sy: number): boolean {
  const n = bx.length;
  const tol = 1e-6;
  for (let i = 0; i < n; i++) {
    const x = sx * (bx[i] as number);
    const y = sy * (by[i] as number);
    let found = false;
    for (let j = 0; j < n; j++) {
      if (
        Math.abs((bx[j] as number) - x) < tol &&
        Math.abs((by[j] as number) - y) < tol &&
        Math.abs((ba[j] as number) - (ba[i] as number)) < 1e-12
      ) {
        found = true;
        break;
      }
    }
    if (!found) return false;
  }
  return true;
}

/** A packed array of n doubles (new Array(n) would make a holey one, slower to read). */
function zeros(n: number): number[] {
  const a: number[] = [];
  for (let i = 0; i < n; i++) a.push(0.5);
  a.fill(0);
  return a;
}

/** Kernel of a resolved section (built once, cached). */
export function kernelOf(section: ResolvedSection): Kernel {
  const hit = (section as WithKernel)[KERNEL] ?? frozenCache.get(section);
  if (hit !== undefined && hit.section === section) return hit;
  if (section === null || typeof section !== "object" || !Array.isArray(section.bars)) {
    throw new TypeError("section must be a ResolvedSection (use resolveSection)");
  }
  const n = section.bars.length;
  if (n < 1) throw new RangeError("section has no bars");
  // plain arrays of doubles: V8 keeps them unboxed, and they allocate far more cheaply
  // than typed arrays (a kernel is built per candidate section in a search)
  const bx: number[] = [];
  const by: number[] = [];
  const ba: number[] = [];
  for (const bar of section.bars) {
    bx.push(bar.x);
    by.push(bar.y);
    ba.push(bar.area);
  }
  const k: Kernel = {
    section,
    n,
    bx,
    by,
    ba,
    bay: ba.map((a, i) => a * (by[i] as number)),
    bax: ba.map((a, i) => a * (bx[i] as number)),
    circle: section.shape === "circle",
    halfB: section.b / 2,
    halfH: section.h / 2,
    R: section.shape === "circle" ? section.D / 2 : 0,
    beta1: section.beta1,
    fy: section.fy,
    es: section.Es,
    k85: 0.85 * section.fc,
    epsTy: section.fy / section.Es,
    phiC: section.confinement === "spiral" ? 0.75 : 0.65,
    P0: section.P0,
    phiPnMax: section.phiPnMax,
    Pnt: section.Pnt,
    symAboutX: isMirrored(bx, by, ba, 1, -1),
    symAboutY: isMirrored(bx, by, ba, -1, 1),
    uni: [undefined, undefined, undefined, undefined],
    scans: [undefined, undefined, undefined, undefined],
    elasticTanRatio: section.Igy > 0 ? section.Igx / section.Igy : 1,
    scratchDir: undefined as unknown as Direction,
  };
  k.scratchDir = newDirection(k);
  if (Object.isExtensible(section)) {
    Object.defineProperty(section, KERNEL, { value: k, enumerable: false, configurable: true, writable: true });
  } else frozenCache.set(section, k);
  return k;
}

/** The section turned by half the bar pitch π/n (cached), for circles (§7.5). */
export function halfPitchOf(k: Kernel): ResolvedSection {
  if (k.halfPitch === undefined) k.halfPitch = rotateSection(k.section, Math.PI / k.n);
  return k.halfPitch;
}

/** An empty direction record for a kernel (filled by setDirection). @internal */
export function newDirection(k: Kernel): Direction {
  const d = zeros(k.n);
  return {
    ux: 0, uy: 0, tmax: 0, depth: 0, d, dt: 0, cFull: 0, cP0: 0,
    nl: k.n, ld: d, lA: k.ba, lAy: k.bay, lAx: k.bax,
  };
}

/**
 * Group the bars of `dir` into layers of equal depth (within 1e-12 of the depth: the
 * same row of a layout), for the cached uniaxial directions evaluated most often.
 */
function groupLayers(k: Kernel, dir: Direction): void {
  const tol = 1e-12 * (dir.depth > 0 ? dir.depth : 1);
  const ld: number[] = [];
  const lA: number[] = [];
  const lAy: number[] = [];
  const lAx: number[] = [];
  for (let i = 0; i < k.n; i++) {
    const di = dir.d[i] as number;
    let j = 0;
    while (j < ld.length && Math.abs((ld[j] as number) - di) > tol) j++;
    if (j === ld.length) {
      ld.push(di);
      lA.push(k.ba[i] as number);
      lAy.push(k.bay[i] as number);
      lAx.push(k.bax[i] as number);
    } else {
      lA[j] = (lA[j] as number) + (k.ba[i] as number);
      lAy[j] = (lAy[j] as number) + (k.bay[i] as number);
      lAx[j] = (lAx[j] as number) + (k.bax[i] as number);
    }
  }
  dir.nl = ld.length;
  dir.ld = ld;
  dir.lA = lA;
  dir.lAy = lAy;
  dir.lAx = lAx;
}

/** Fill `dir` for the unit vector (ux, uy) (one layer per bar). */
export function setDirection(k: Kernel, ux: number, uy: number, dir: Direction): Direction {
  const tmax = k.circle ? k.R : k.halfB * Math.abs(ux) + k.halfH * Math.abs(uy);
  const depth = 2 * tmax;
  let dt = 0;
  for (let i = 0; i < k.n; i++) {
    const d = tmax - ((k.bx[i] as number) * ux + (k.by[i] as number) * uy);
    dir.d[i] = d;
    if (d > dt) dt = d;
  }
  dir.ux = ux;
  dir.uy = uy;
  dir.tmax = tmax;
  dir.depth = depth;
  dir.dt = dt;
  dir.cFull = depth / k.beta1;
  // every bar yields in compression once 0.003 (c − d)/c ≥ εty, i.e. c ≥ 0.003 d / (0.003 − εty)
  const cYield = (EPS_CU * dt) / (EPS_CU - k.epsTy);
  dir.cP0 = Math.max(dir.cFull, cYield) * (1 + 1e-12);
  return dir;
}

/** Unit vector for a uniaxial direction index, exact (no sin/cos round-off). */
const UNI_UX = [0, 1, 0, -1] as const;
const UNI_UY = [1, 0, -1, 0] as const;

/**
 * Cached uniaxial direction of a kernel: 0 compresses +y (+Mx), 1 +x (+My), 2 −y, 3 −x.
 * @internal
 * @example uniDirection(kernelOf(section), 0).cFull // h / β1
 */
export function uniDirection(k: Kernel, idx: 0 | 1 | 2 | 3): Direction {
  let dir = k.uni[idx];
  if (dir === undefined) {
    dir = setDirection(k, UNI_UX[idx], UNI_UY[idx], newDirection(k));
    groupLayers(k, dir);
    k.uni[idx] = dir;
  }
  return dir;
}

const blockOut = new Float64Array(3);

/**
 * Forces at neutral-axis depth c (in) for direction `dir`: out = [Pn, Mx, My, εt].
 * c = 0 is pure tension (every bar at −fy, εt reported as εty + 0.003); c = ∞ is
 * uniform compression strain εcu.
 */
export function evaluate(k: Kernel, dir: Direction, c: number, out: Float64Array): void {
  const n = k.n;
  const bx = k.bx;
  const by = k.by;
  const ba = k.ba;
  const fy = k.fy;
  if (!(c > 0)) {
    let P = 0;
    let mx = 0;
    let my = 0;
    for (let i = 0; i < n; i++) {
      const F = -fy * (ba[i] as number);
      P += F;
      mx += F * (by[i] as number);
      my += F * (bx[i] as number);
    }
    out[0] = P;
    out[1] = mx;
    out[2] = my;
    out[3] = k.epsTy + EPS_CU;
    return;
  }
  const depth = dir.depth;
  let a = k.beta1 * c;
  if (a > depth) a = depth;
  let area: number;
  let xc: number;
  let yc: number;
  if (k.circle) {
    if (a >= depth) {
      area = Math.PI * k.R * k.R;
      xc = 0;
      yc = 0;
    } else {
      segmentInto(k.R, a, blockOut);
      area = blockOut[0] as number;
      const dist = blockOut[1] as number;
      xc = dir.ux * dist;
      yc = dir.uy * dist;
    }
  } else if (dir.ux === 0 || dir.uy === 0) {
    area = (dir.ux === 0 ? 2 * k.halfB : 2 * k.halfH) * a;
    const t = dir.tmax - a / 2;
    xc = dir.ux * t;
    yc = dir.uy * t;
  } else {
    rectangleBlockInto(k.halfB, k.halfH, dir.ux, dir.uy, a, blockOut);
    area = blockOut[0] as number;
    xc = blockOut[1] as number;
    yc = blockOut[2] as number;
  }
  const k85 = k.k85;
  const Cc = k85 * area;
  let P = Cc;
  let mx = Cc * yc;
  let my = Cc * xc;
  const esEps = k.es * EPS_CU;
  const inv = 1 / c;
  const nl = dir.nl;
  const ld = dir.ld;
  const lA = dir.lA;
  const lAy = dir.lAy;
  const lAx = dir.lAx;
  for (let i = 0; i < nl; i++) {
    const di = ld[i] as number;
    // branch-free clamp: the yield tests are data-dependent and mispredict
    const fs = Math.max(-fy, Math.min(fy, esEps * (1 - di * inv))) - (di < a ? k85 : 0);
    P += fs * (lA[i] as number);
    mx += fs * (lAy[i] as number);
    my += fs * (lAx[i] as number);
  }
  out[0] = P;
  out[1] = mx;
  out[2] = my;
  out[3] = EPS_CU * (dir.dt * inv - 1);
}

const evalOut = new Float64Array(4);
/** depth of the values held in evalOut (set by phiPnAt) */
const lastEval = { c: Number.NaN };

/** φ·Pn at c (kip). */
export function phiPnAt(k: Kernel, dir: Direction, c: number): number {
  evaluate(k, dir, c, evalOut);
  lastEval.c = c;
  return phiOf(evalOut[3] as number, k.epsTy, k.phiC) * (evalOut[0] as number);
}

/** Number of uniform grid intervals over 0 < c ≤ cFull in a scan. */
const SCAN_INTERVALS = 24;

/** Build the φPn scan of a direction (see {@link Scan}). */
export function buildScan(k: Kernel, dir: Direction): Scan {
  // grid depths; a step (displaced concrete) is flagged by a positive area
  const cs: number[] = [0];
  const as: number[] = [0];
  for (let i = 1; i <= SCAN_INTERVALS; i++) {
    cs.push((dir.cFull * i) / SCAN_INTERVALS);
    as.push(0);
  }
  if (dir.cP0 > dir.cFull) {
    const r = dir.cP0 / dir.cFull;
    for (let i = 1; i <= 3; i++) {
      cs.push(dir.cFull * Math.pow(r, i / 3));
      as.push(0);
    }
  }
  if (dir.dt > 0) {
    cs.push((EPS_CU * dir.dt) / (EPS_CU + k.epsTy), (EPS_CU * dir.dt) / (2 * EPS_CU + k.epsTy));
    as.push(0, 0);
  }
  for (let i = 0; i < k.n; i++) {
    const di = dir.d[i] as number;
    if (di > 0 && di < dir.depth) {
      cs.push(di / k.beta1);
      as.push(k.ba[i] as number);
    }
  }
  // insertion sort (a few dozen entries), merging coincident depths (step areas add)
  const tol = 1e-9 * dir.cP0;
  const sc: number[] = [];
  const sa: number[] = [];
  for (let i = 0; i < cs.length; i++) {
    const c = cs[i] as number;
    const area = as[i] as number;
    let pos = sc.length;
    while (pos > 0 && (sc[pos - 1] as number) > c + tol) pos--;
    if (pos > 0 && Math.abs((sc[pos - 1] as number) - c) <= tol) {
      sa[pos - 1] = (sa[pos - 1] as number) + area;
    } else {
      sc.splice(pos, 0, c);
      sa.splice(pos, 0, area);
    }
  }
  const m = sc.length;
  const cL: number[] = [];
  const cR: number[] = [];
  const vL: number[] = [];
  const vR: number[] = [];
  for (let i = 0; i < m; i++) {
    const c = sc[i] as number;
    const area = sa[i] as number;
    if (area > 0) {
      // left limit evaluated just below the step; the right limit differs only by the
      // displaced concrete of the bars entering the block (φ and all else are continuous)
      const lo = c * (1 - 1e-10);
      evaluate(k, dir, lo, evalOut);
      const phi = phiOf(evalOut[3] as number, k.epsTy, k.phiC);
      cL.push(lo);
      cR.push(c * (1 + 1e-10));
      vL.push(phi * (evalOut[0] as number));
      vR.push(phi * ((evalOut[0] as number) - k.k85 * area));
    } else {
      const v = phiPnAt(k, dir, c);
      cL.push(c);
      cR.push(c);
      vL.push(v);
      vR.push(v);
    }
  }
  return { dir, m, cL, cR, vL, vR };
}

/**
 * Cached φPn scan of a uniaxial direction (built on first use).
 * @internal
 * @example uniScan(kernelOf(section), 0).m // number of grid points
 */
export function uniScan(k: Kernel, idx: 0 | 1 | 2 | 3): Scan {
  let s = k.scans[idx];
  if (s === undefined) {
    s = buildScan(k, uniDirection(k, idx));
    k.scans[idx] = s;
  }
  return s;
}

/**
 * Root of φPn(c) − Pu on (lo, hi) where the function is continuous and changes sign.
 *
 * Inverse quadratic interpolation through the last three iterates (secant while only two
 * exist), kept inside the shrinking bracket; a bisection step is taken whenever an
 * estimate falls outside the bracket or fails to halve the residual, so the bracket
 * always closes. Between the scan's grid depths φPn(c) is smooth apart from bar-yield
 * kinks, so 2–4 evaluations reach |φPn − Pu| ≤ 1e-11 P0. The last depth returned was
 * the last evaluated (callers reuse its forces).
 */
export function solveC(k: Kernel, dir: Direction, Pu: number, lo: number, flo: number, hi: number, fhi: number): number {
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  const ftol = 1e-11 * (k.P0 > 0 ? k.P0 : 1);
  const xtol = 1e-13 * dir.cP0;
  let a = lo;
  let fa = flo;
  let b = hi;
  // the two previous iterates (the bracket ends to begin with)
  let x0 = lo;
  let f0 = flo;
  let x1 = hi;
  let f1 = fhi;
  let x = lo - (flo * (hi - lo)) / (fhi - flo);
  if (!(x > a && x < b)) x = 0.5 * (a + b);
  for (let iter = 0; iter < 200; iter++) {
    const fx = phiPnAt(k, dir, x) - Pu;
    if (Math.abs(fx) <= ftol) return x;
    if (fx < 0 === fa < 0) {
      a = x;
      fa = fx;
    } else b = x;
    if (b - a <= xtol + 2e-15 * Math.abs(x)) return x;
    let next: number;
    if (f0 !== f1 && f0 !== fx && f1 !== fx) {
      next =
        (x0 * f1 * fx) / ((f0 - f1) * (f0 - fx)) +
        (x1 * f0 * fx) / ((f1 - f0) * (f1 - fx)) +
        (x * f0 * f1) / ((fx - f0) * (fx - f1));
    } else next = x - (fx * (x - x1)) / (fx - f1);
    // safeguard: bisect when the estimate leaves the bracket or the residual did not halve
    if (!(next > a && next < b) || Math.abs(fx) > 0.5 * Math.abs(f1)) next = 0.5 * (a + b);
    x0 = x1;
    f0 = f1;
    x1 = x;
    f1 = fx;
    x = next;
  }
  return x;
}

/** Result of a root search: the governing (smallest-moment) root. */
export interface RootResult {
  c: number;
  Pn: number;
  Mx: number;
  My: number;
  epsT: number;
  phi: number;
}

const rootOut = new Float64Array(4);

/** Copy [Pn, Mx, My, εt] element by element (TypedArray.set is a native call, slower for 4 values). */
function copyForces(from: Float64Array, to: Float64Array): void {
  to[0] = from[0] as number;
  to[1] = from[1] as number;
  to[2] = from[2] as number;
  to[3] = from[3] as number;
}

/**
 * Every root of φPn(c) = Pu bracketed by the scan; returns the one with the smallest
 * design moment φ·(Mx, My)·(px, py) (§7.6), or fills `res` with NaN c
 * when none is found. Assumes −0.9 Pnt < Pu ≤ φPn,max.
 */
export function solveScan(k: Kernel, scan: Scan, Pu: number, px: number, py: number, res: RootResult): RootResult {
  const { m, cL, cR, vL, vR, dir } = scan;
  let best = Number.POSITIVE_INFINITY;
  res.c = Number.NaN;
  for (let i = 0; i + 1 < m; i++) {
    const f0 = (vR[i] as number) - Pu;
    const f1 = (vL[i + 1] as number) - Pu;
    if (f0 < 0 === f1 < 0) continue;
    lastEval.c = Number.NaN;
    const c = solveC(k, dir, Pu, cR[i] as number, f0, cL[i + 1] as number, f1);
    if (c === lastEval.c) copyForces(evalOut, rootOut);
    else evaluate(k, dir, c, rootOut);
    // the design capacity φMn decides (§7.6), not Mn: the roots may carry different φ
    const mProj = phiOf(rootOut[3] as number, k.epsTy, k.phiC) * ((rootOut[1] as number) * px + (rootOut[2] as number) * py);
    if (mProj < best) {
      best = mProj;
      res.c = c;
      res.Pn = rootOut[0] as number;
      res.Mx = rootOut[1] as number;
      res.My = rootOut[2] as number;
      res.epsT = rootOut[3] as number;
      res.phi = phiOf(res.epsT, k.epsTy, k.phiC);
    }
  }
  return res;
}

/**
 * One root of φPn(c) = Pu on [0, cP0] by solveC on the whole bracket, optionally
 * starting from a guess (used inside the biaxial angle iteration, where speed matters
 * more than catching every root; the final angle is re-solved with a full scan).
 * `warm.slope` carries the secant slope dφPn/dc from one call to the next of the same
 * iteration (0: none yet); the caller owns it, so no state outlives the iteration.
 */
export function solveSingle(
  k: Kernel, dir: Direction, Pu: number, guess: number, res: RootResult, warm: { slope: number }, ftolRel = 1e-11,
): RootResult {
  let lo = 0;
  let hi = dir.cP0;
  let flo = -PHI_TENSION * k.Pnt - Pu;
  let fhi = k.phiC * k.P0 - Pu;
  const ftol = ftolRel * (k.P0 > 0 ? k.P0 : 1);
  let c = Number.NaN;
  lastEval.c = Number.NaN;
  if (guess > 0 && guess < hi) {
    // warm start: secant steps from the previous root, kept inside a shrinking bracket
    let c0 = guess;
    let f0 = phiPnAt(k, dir, c0) - Pu;
    let slope = warm.slope > 0 ? warm.slope : (fhi - flo) / (hi - lo);
    for (let iter = 0; iter < 6; iter++) {
      if (f0 < 0) {
        lo = c0;
        flo = f0;
      } else {
        hi = c0;
        fhi = f0;
      }
      if (Math.abs(f0) <= ftol) {
        c = c0;
        break;
      }
      const c1 = c0 - f0 / slope;
      if (!(c1 > lo && c1 < hi)) break;
      const f1 = phiPnAt(k, dir, c1) - Pu;
      const sNew = (f1 - f0) / (c1 - c0);
      if (sNew > 0 && Number.isFinite(sNew)) slope = sNew;
      c0 = c1;
      f0 = f1;
    }
    if (slope > 0) warm.slope = slope;
    if (Number.isNaN(c) && Math.abs(f0) <= ftol) c = c0;
  }
  if (Number.isNaN(c)) c = solveC(k, dir, Pu, lo, flo, hi, fhi);
  if (c !== lastEval.c) evaluate(k, dir, c, evalOut);
  lastEval.c = Number.NaN;
  res.c = c;
  res.Pn = evalOut[0] as number;
  res.Mx = evalOut[1] as number;
  res.My = evalOut[2] as number;
  res.epsT = evalOut[3] as number;
  res.phi = phiOf(res.epsT, k.epsTy, k.phiC);
  return res;
}

/** Insert a step (c, area) into the sorted lists, merging coincident steps; returns the new length. */
function insertStep(cj: Float64Array, aj: Float64Array, m: number, c: number, area: number, mergeTol: number): number {
  let pos = m;
  while (pos > 0 && (cj[pos - 1] as number) > c + mergeTol) pos--;
  if (pos > 0 && Math.abs((cj[pos - 1] as number) - c) <= mergeTol) {
    aj[pos - 1] = (aj[pos - 1] as number) + area;
    return m;
  }
  for (let q = m; q > pos; q--) {
    cj[q] = cj[q - 1] as number;
    aj[q] = aj[q - 1] as number;
  }
  cj[pos] = c;
  aj[pos] = area;
  return m + 1;
}

const jumpC = { buf: new Float64Array(16) };
const jumpA = { buf: new Float64Array(16) };
const multiOut = new Float64Array(4);

const stepL = { buf: new Float64Array(16) };
const stepPhi = { buf: new Float64Array(16) };
const localOut = new Float64Array(4);

/**
 * Like {@link solveMulti}, starting from a root `known` already found in this direction:
 * the step nodes are evaluated outward from it only as far as another root is possible.
 * Between steps φPn rises with c (checked by the tests for a range of sections), and a
 * step lowers it by at most 0.9·0.85 f'c·A of its bars, so once a node lies further from
 * Pu than all the remaining steps together can bridge, no further root exists that way.
 * The smallest design moment projected on (px, py) governs (§7.6).
 */
export function solveNear(
  k: Kernel, dir: Direction, Pu: number, px: number, py: number, res: RootResult, known: number,
): RootResult {
  const n = k.n;
  if (jumpC.buf.length < n + 3) {
    jumpC.buf = new Float64Array((n + 3) * 2);
    jumpA.buf = new Float64Array((n + 3) * 2);
  }
  if (stepL.buf.length < n + 3) {
    stepL.buf = new Float64Array((n + 3) * 2);
    stepPhi.buf = new Float64Array((n + 3) * 2);
  }
  const cj = jumpC.buf;
  const aj = jumpA.buf;
  const mergeTol = 1e-9 * dir.cP0;
  let m = 0;
  for (let i = 0; i < n; i++) {
    const di = dir.d[i] as number;
    if (di > 0 && di < dir.depth) m = insertStep(cj, aj, m, di / k.beta1, k.ba[i] as number, mergeTol);
  }
  for (let j = 0; j < m; j++) stepL.buf[j] = Number.NaN;
  near.k = k;
  near.dir = dir;
  near.Pu = Pu;
  near.px = px;
  near.py = py;
  near.res = res;
  near.best = Number.POSITIVE_INFINITY;
  res.c = Number.NaN;
  foundRoots.n = 0;
  considerRoot(known);
  let p = 0;
  while (p < m && (cj[p] as number) < known) p++;
  const dUnit = PHI_TENSION * k.k85;
  // right of the known root: piece j + 1 starts just above step j
  let reach = 0;
  for (let j = p; j < m; j++) reach += dUnit * (aj[j] as number);
  for (let j = p; j < m; j++) {
    reach -= dUnit * (aj[j] as number);
    const r = stepRight(j);
    if (r < 0) {
      const cEnd = j + 1 < m ? (cj[j + 1] as number) * (1 - 1e-10) : dir.cP0;
      const fEnd = j + 1 < m ? stepLeft(j + 1) : k.phiC * k.P0 - Pu;
      if (fEnd >= 0) considerRoot(solveC(k, dir, Pu, (cj[j] as number) * (1 + 1e-10), r, cEnd, fEnd));
    } else if (r > reach) break;
  }
  // left of the known root: piece j ends just below step j
  reach = 0;
  for (let j = 0; j < p; j++) reach += dUnit * (aj[j] as number);
  for (let j = p - 1; j >= 0; j--) {
    reach -= dUnit * (aj[j] as number);
    const l = stepLeft(j);
    if (l > 0) {
      const cStart = j > 0 ? (cj[j - 1] as number) * (1 + 1e-10) : 0;
      const fStart = j > 0 ? stepRight(j - 1) : -PHI_TENSION * k.Pnt - Pu;
      if (fStart < 0) considerRoot(solveC(k, dir, Pu, cStart, fStart, (cj[j] as number) * (1 - 1e-10), l));
    } else if (l < -reach) break;
  }
  return res;
}

/** State of the current {@link solveNear} call (module level: no closures per call). */
const near = {
  k: null as Kernel | null,
  dir: null as Direction | null,
  Pu: 0,
  px: 0,
  py: 0,
  res: null as RootResult | null,
  best: 0,
};

/** φPn − Pu just below step j (memoised), with φ there kept in stepPhi. */
function stepLeft(j: number): number {
  let v = stepL.buf[j] as number;
  if (Number.isNaN(v)) {
    const k = near.k as Kernel;
    evaluate(k, near.dir as Direction, (jumpC.buf[j] as number) * (1 - 1e-10), localOut);
    const phi = phiOf(localOut[3] as number, k.epsTy, k.phiC);
    v = phi * (localOut[0] as number) - near.Pu;
    stepL.buf[j] = v;
    stepPhi.buf[j] = phi;
  }
  return v;
}

/** φPn − Pu just above step j: the left value less the displaced concrete entering there. */
function stepRight(j: number): number {
  const v = stepLeft(j);
  return v - (stepPhi.buf[j] as number) * (near.k as Kernel).k85 * (jumpA.buf[j] as number);
}

/**
 * Every root the last solveNear / solveMulti call found (depths c, in), so that a caller can
 * follow each root's branch (phi-mn-at-angle.ts: several angles may satisfy the direction).
 * @internal
 */
export const foundRoots = { c: new Float64Array(16), n: 0 };

function recordRoot(c: number): void {
  if (foundRoots.n === foundRoots.c.length) {
    const grown = new Float64Array(foundRoots.c.length * 2);
    grown.set(foundRoots.c);
    foundRoots.c = grown;
  }
  foundRoots.c[foundRoots.n++] = c;
}

function considerRoot(c: number): void {
  recordRoot(c);
  const k = near.k as Kernel;
  const res = near.res as RootResult;
  evaluate(k, near.dir as Direction, c, localOut);
  const phi = phiOf(localOut[3] as number, k.epsTy, k.phiC);
  const mProj = phi * ((localOut[1] as number) * near.px + (localOut[2] as number) * near.py);
  if (mProj < near.best) {
    near.best = mProj;
    res.c = c;
    res.Pn = localOut[0] as number;
    res.Mx = localOut[1] as number;
    res.My = localOut[2] as number;
    res.epsT = localOut[3] as number;
    res.phi = phi;
  }
}

/**
 * Every root of φPn(c) = Pu for an arbitrary direction without a cached scan: the
 * nodes are c = 0, each displaced-concrete step c = d/β1 (left value evaluated, right
 * value = left − φ·0.85 f'c·A of the bars entering the block, exact because φ and the
 * rest of the section are continuous there), the two φ-transition ends, and c(P0).
 * Each continuous interval with a sign change is solved by Brent; the smallest moment
 * projected on (px, py) governs (§7.6). Assumes −0.9 Pnt < Pu ≤ φPn,max.
 */
export function solveMulti(
  k: Kernel, dir: Direction, Pu: number, px: number, py: number, res: RootResult, known = Number.NaN,
): RootResult {
  const n = k.n;
  const cap = n + 3;
  if (jumpC.buf.length < cap) {
    jumpC.buf = new Float64Array(cap * 2);
    jumpA.buf = new Float64Array(cap * 2);
  }
  const cj = jumpC.buf;
  const aj = jumpA.buf;
  const mergeTol = 1e-9 * dir.cP0;
  let m = 0;
  for (let i = 0; i < n; i++) {
    const di = dir.d[i] as number;
    if (di > 0 && di < dir.depth) m = insertStep(cj, aj, m, di / k.beta1, k.ba[i] as number, mergeTol);
  }
  if (dir.dt > 0) {
    // φ-transition ends: nodes without a step
    m = insertStep(cj, aj, m, (EPS_CU * dir.dt) / (EPS_CU + k.epsTy), 0, mergeTol);
    m = insertStep(cj, aj, m, (EPS_CU * dir.dt) / (2 * EPS_CU + k.epsTy), 0, mergeTol);
  }
  let best = Number.POSITIVE_INFINITY;
  res.c = Number.NaN;
  foundRoots.n = 0;
  let cPrev = 0;
  let fPrev = -PHI_TENSION * k.Pnt - Pu;
  for (let j = 0; j <= m; j++) {
    let cLeft: number;
    let fLeft: number;
    let cRight: number;
    let fRight: number;
    if (j < m) {
      const c = cj[j] as number;
      const area = aj[j] as number;
      cLeft = area > 0 ? c * (1 - 1e-10) : c;
      evaluate(k, dir, cLeft, multiOut);
      const phi = phiOf(multiOut[3] as number, k.epsTy, k.phiC);
      fLeft = phi * (multiOut[0] as number) - Pu;
      cRight = area > 0 ? c * (1 + 1e-10) : c;
      fRight = fLeft - phi * k.k85 * area;
    } else {
      cLeft = dir.cP0;
      fLeft = k.phiC * k.P0 - Pu;
      cRight = cLeft;
      fRight = fLeft;
    }
    if (fPrev < 0 !== fLeft < 0) {
      lastEval.c = Number.NaN;
      // a root already known to lie in this interval (from the angle iteration) is reused
      const c = known > cPrev && known < cLeft ? known : solveC(k, dir, Pu, cPrev, fPrev, cLeft, fLeft);
      recordRoot(c);
      if (c === lastEval.c) copyForces(evalOut, multiOut);
      else evaluate(k, dir, c, multiOut);
      const mProj = phiOf(multiOut[3] as number, k.epsTy, k.phiC) * ((multiOut[1] as number) * px + (multiOut[2] as number) * py);
      if (mProj < best) {
        best = mProj;
        res.c = c;
        res.Pn = multiOut[0] as number;
        res.Mx = multiOut[1] as number;
        res.My = multiOut[2] as number;
        res.epsT = multiOut[3] as number;
        res.phi = phiOf(res.epsT, k.epsTy, k.phiC);
      }
    }
    cPrev = cRight;
    fPrev = fRight;
  }
  return res;
}

/** A fresh root record (reused by callers to avoid allocation). @internal */
export function newRoot(): RootResult {
  return { c: Number.NaN, Pn: 0, Mx: 0, My: 0, epsT: 0, phi: 0 };
}

/** Validate a factored axial load and say whether it is within −0.9 Pnt … φPn,max. */
export function axialInRange(k: Kernel, Pu: number): boolean {
  if (typeof Pu !== "number" || !Number.isFinite(Pu)) throw new RangeError(`Pu must be a finite number (got ${String(Pu)})`);
  return Pu <= k.phiPnMax && Pu >= -PHI_TENSION * k.Pnt;
}
