import type { MomentCapacity, ResolvedSection } from "../types";
import { findRoot } from "./find-root";
import {
  PHI_TENSION, axialInRange, evaluate, foundRoots, kernelOf, newRoot, phiPnAt, setDirection, solveC, solveMulti, solveNear, solveSingle,
  type Direction, type Kernel,
} from "./section-kernel";
import { snapUnit } from "./section-forces-at";
import { phiOf } from "./phi-factor";

/** Biaxial capacity plus the neutral-axis angle that produced it. */
export type BiaxialCapacity = MomentCapacity & {
  /** neutral-axis angle α, radians in (−π, π]: compression side u = (sin α, cos α) */
  alpha: number;
};

const root = newRoot();
const tensionOut = new Float64Array(4);

function wrapAngle(a: number): number {
  let x = a % (2 * Math.PI);
  if (x > Math.PI) x -= 2 * Math.PI;
  else if (x <= -Math.PI) x += 2 * Math.PI;
  return x;
}

/**
 * Biaxial design moment strength at Pu in the direction of the applied resultant
 * moment vector, by rotating the neutral axis (column-checks.md §2, §7.4).
 *
 * `thetaRad` = atan2(My, Mx): measured from the +Mx axis toward +My (θ = 0 is pure Mx
 * compressing the +y face; θ = π/2 pure My compressing the +x face). For each trial
 * neutral-axis angle α (compression side u = (sin α, cos α)) the depth c is solved for
 * φPn(c) = Pu; α is iterated (secant steps, bisection-safeguarded once bracketed,
 * |Δθ| ≤ 1e-11 rad) until the nominal moment vector (Mnx, Mny) points along θ. At the
 * final α the other
 * roots in c are sought outward from the one found (φPn rises with c between
 * displaced-concrete steps, so the search stops once no step can bring φPn back to Pu);
 * if a smaller one exists, its branch is followed in α to θ as well and the smaller
 * capacity governs (§7.6). The capacity is the magnitude φ √(Mnx² + Mny²). If the local
 * iteration fails, α is scanned round the full circle and the smallest capacity among
 * the solutions governs; a direction no neutral axis can produce at this Pu (a strongly
 * unsymmetric section under high axial load) has zero capacity.
 *
 * The result depends on (section, Pu, θ) only: every call starts from the same state (the
 * elastic guess tan α = tan θ · Igx/Igy and its slope dθ/dα), so it does not matter which
 * cases ran before on the same section. Warm starts are used only within one call.
 *
 * For a symmetric section θ = 0 and θ = π/2 give exactly phiMnAt about x and about y.
 * Circles: see circleCapacityAt for the project's orientation rule (§7.5).
 *
 * @param section from resolveSection
 * @param Pu factored axial load, kip (compression +)
 * @param thetaRad direction of the moment vector, radians (finite)
 * @returns capacity with `alpha`, or null when Pu > φPn,max or Pu < −0.9 Pnt
 * @throws RangeError for non-finite Pu or theta
 * @example phiMnAtAngle(section, 300, Math.atan2(My, Mx))?.phiMn
 */
export function phiMnAtAngle(section: ResolvedSection, Pu: number, thetaRad: number): BiaxialCapacity | null {
  if (typeof thetaRad !== "number" || !Number.isFinite(thetaRad)) {
    throw new RangeError(`thetaRad must be finite (got ${String(thetaRad)})`);
  }
  const k = kernelOf(section);
  if (!axialInRange(k, Pu)) return null;
  const theta = wrapAngle(thetaRad);
  if (Pu <= -PHI_TENSION * k.Pnt) {
    const dir = k.scratchDir;
    setDirection(k, snapUnit(Math.sin(theta)), snapUnit(Math.cos(theta)), dir);
    evaluate(k, dir, 0, tensionOut);
    const Mn = Math.hypot(tensionOut[1] as number, tensionOut[2] as number);
    return { phiMn: PHI_TENSION * Mn, Mn, phi: PHI_TENSION, c: 0, epsT: tensionOut[3] as number, alpha: theta };
  }
  // start from the same state on every call: where several roots exist, which branch
  // the iteration meets first must not depend on earlier calls
  st.alphaSlope = 1;
  st.slope = 0;
  st.k = k;
  st.Pu = Pu;
  st.theta = theta;
  st.guess = 0;
  st.degenerate = false;
  st.lastAlpha = Number.NaN;
  st.prevAlpha = Number.NaN;
  st.prevC = 0;
  st.mScale = 1e-12 * k.P0 * Math.max(k.section.b, k.section.h);
  // |Δθ| ≤ 1e-11 rad, and c solved to 1e-11 P0 at every step
  const tol = 1e-11;
  // first guess: the elastic neutral axis of a moment at θ has tan α = tan θ · Ix/Iy
  let a = Math.atan2(k.elasticTanRatio * Math.sin(theta), Math.cos(theta));
  let fa = errAt(a);
  let alpha = a;
  let found = Math.abs(fa) <= tol || st.degenerate;
  if (!found) {
    // secant steps, kept inside a bracket once one is known (bisection when a step
    // leaves it); the first step uses the elastic section's slope dθ/dα: with
    // tan θ = tan α / r, dθ/dα = r / (r² cos²α + sin²α)
    const r = k.elasticTanRatio;
    const ca = Math.cos(a);
    const sa = Math.sin(a);
    st.alphaSlope = r / (r * r * ca * ca + sa * sa);
    let b = a + clampStep(-fa / st.alphaSlope);
    let fb = errAt(b);
    let lo = Number.NaN;
    let flo = 0;
    let hi = Number.NaN;
    let fhi = 0;
    for (let iter = 0; iter < 60 && !st.degenerate; iter++) {
      alpha = b;
      if (Math.abs(fb) <= tol) {
        found = true;
        break;
      }
      if (Number.isNaN(lo)) {
        if (fa < 0 !== fb < 0 && Math.abs(b - a) < Math.PI / 2) {
          lo = Math.min(a, b);
          hi = Math.max(a, b);
          flo = lo === a ? fa : fb;
          fhi = hi === a ? fa : fb;
        }
      } else if (fb < 0 === flo < 0) {
        lo = b;
        flo = fb;
      } else {
        hi = b;
        fhi = fb;
      }
      // a bracket that shrinks to nothing without a small error is the ±π wrap of the
      // error (a direction the contour does not reach), not a root
      if (!Number.isNaN(lo) && hi - lo < 1e-12) break;
      const slope = (fb - fa) / (b - a);
      if (slope > 0.05 && slope < 20) st.alphaSlope = slope;
      let next = b - fb / slope;
      if (!Number.isNaN(lo)) {
        if (!(next > lo && next < hi)) next = flo !== fhi ? lo - (flo * (hi - lo)) / (fhi - flo) : (lo + hi) / 2;
        if (!(next > lo && next < hi) || iter > 12) next = (lo + hi) / 2;
      } else if (!Number.isFinite(next) || Math.abs(next - b) > Math.PI / 4) {
        next = b + clampStep(-fb);
      }
      a = b;
      fa = fb;
      b = next;
      fb = errAt(b);
    }
  }
  if (!found && !st.degenerate) return scanAngles(k, Pu, theta, tol);
  return capacityAtAlpha(k, Pu, theta, alpha, st.lastAlpha === alpha ? st.guess : Number.NaN);
}

/**
 * Final step at a converged α: every root in c, the smallest capacity along θ governs (§7.6).
 * A displaced-concrete step can give several roots at α; each lies on its own branch, whose
 * moment points slightly off θ here and reaches θ at a nearby angle, with a capacity that
 * may be smaller than the one the iteration followed (seen: 0.1 % smaller). Each other branch is therefore followed in α on its own (between the
 * same two steps) until it points along θ, and the smallest of all governs.
 */
function capacityAtAlpha(k: Kernel, Pu: number, theta: number, alpha: number, known: number): BiaxialCapacity {
  const dir = k.scratchDir;
  setDirection(k, snapUnit(Math.sin(alpha)), snapUnit(Math.cos(alpha)), dir);
  if (Number.isNaN(known)) solveMulti(k, dir, Pu, Math.cos(theta), Math.sin(theta), root);
  else solveNear(k, dir, Pu, Math.cos(theta), Math.sin(theta), root, known);
  if (Number.isNaN(root.c)) solveSingle(k, dir, Pu, 0, root, st);
  const main = capacityOf(k, alpha);
  let best = main;
  let followedC = main.c;
  if (!Number.isNaN(known) && Math.abs(main.c - known) > 1e-9 * dir.cP0) {
    // the iteration's own root at α points along θ; the smallest-moment root here does not
    evaluate(k, dir, known, forcesOut);
    const MnKnown = Math.hypot(forcesOut[1] as number, forcesOut[2] as number);
    const phiKnown = phiOf(forcesOut[3] as number, k.epsTy, k.phiC);
    best = { phiMn: phiKnown * MnKnown, Mn: MnKnown, phi: phiKnown, c: known, epsT: forcesOut[3] as number, alpha: wrapAngle(alpha) };
    followedC = known;
  }
  // copy: following a branch solves again at other angles
  const others: number[] = [];
  for (let i = 0; i < foundRoots.n; i++) {
    const c = foundRoots.c[i] as number;
    if (Math.abs(c - followedC) > 1e-9 * dir.cP0) others.push(c);
  }
  for (const c of others) {
    const branch = trackBranch(k, Pu, theta, alpha, c);
    if (branch !== null && branch.phiMn < best.phiMn) best = branch;
  }
  const across = acrossNearbySteps(k, Pu, theta, alpha, followedC);
  return across !== null && across.phiMn < best.phiMn ? across : best;
}

/** Angle offsets (rad) at which the pieces across the steps next to the root are probed. */
const PROBES = [0.003, -0.003, 0.01, -0.01];

/**
 * The pieces just across the displaced-concrete steps below and above the followed root c0
 * at α0 may hold no root at α0 yet one a little way off, whose branch reaches θ with a
 * smaller capacity (the root jumps across the step as α changes; seen: up to 0.2 % smaller,
 * 3 directions in 600 random ones). When a step lies within 5 % of the block-full depth of
 * c0, its far piece is probed at
 * a few nearby angles and, where it holds a root, followed to θ. Returns the smallest such
 * capacity, or null.
 */
function acrossNearbySteps(k: Kernel, Pu: number, theta: number, alpha0: number, c0: number): BiaxialCapacity | null {
  const dir = k.scratchDir;
  setDirection(k, snapUnit(Math.sin(alpha0)), snapUnit(Math.cos(alpha0)), dir);
  const near = 0.05 * dir.cFull;
  // the nearest step on each side (the far piece runs from it to the next step beyond)
  stepsAround(k, dir, c0);
  const below = around.below;
  const above = around.above;
  let best: BiaxialCapacity | null = null;
  for (const step of [below, above]) {
    if (step < 0) continue;
    const cStep = (dir.d[step] as number) / k.beta1;
    if (Math.abs(cStep - c0) > near) continue;
    const side = cStep > c0 ? 1 : -1;
    for (const delta of PROBES) {
      const a1 = alpha0 + delta;
      setDirection(k, snapUnit(Math.sin(a1)), snapUnit(Math.cos(a1)), dir);
      const cs = (dir.d[step] as number) / k.beta1;
      // the far piece: from this step to the next step beyond it (or the end of the range)
      stepsAround(k, dir, cs);
      const beyond = side > 0 ? around.above : around.below;
      const cEnd = beyond >= 0 ? (dir.d[beyond] as number) / k.beta1 : side > 0 ? dir.cP0 : 0;
      const lo = Math.min(cs, cEnd);
      const hi = Math.max(cs, cEnd);
      const fLo = phiPnAt(k, dir, lo > 0 ? lo * (1 + 1e-10) : 0) - Pu;
      const fHi = phiPnAt(k, dir, hi * (1 - 1e-10)) - Pu;
      if (fLo < 0 === fHi < 0) continue;
      const branch = trackBranch(k, Pu, theta, a1, 0.5 * (lo + hi));
      if (branch !== null && (best === null || branch.phiMn < best.phiMn)) best = branch;
      break;
    }
    setDirection(k, snapUnit(Math.sin(alpha0)), snapUnit(Math.cos(alpha0)), dir);
  }
  return best;
}

const forcesOut = new Float64Array(4);

function capacityOf(k: Kernel, alpha: number): BiaxialCapacity {
  const Mn = Math.hypot(root.Mx, root.My);
  const phi = phiOf(root.epsT, k.epsTy, k.phiC);
  return { phiMn: phi * Mn, Mn, phi, c: root.c, epsT: root.epsT, alpha: wrapAngle(alpha) };
}

/** The bars of the nearest displaced-concrete steps below and above a depth (−1: none); see stepsAround. */
const around = { below: -1, above: -1 };

/**
 * Fill `around` with the bars whose steps c = d/β1 (bars inside the section depth) lie
 * nearest strictly below and strictly above c in direction `dir`.
 */
function stepsAround(k: Kernel, dir: Direction, c: number): void {
  let below = -1;
  let above = -1;
  let cBelow = 0;
  let cAbove = Number.POSITIVE_INFINITY;
  for (let i = 0; i < k.n; i++) {
    const di = dir.d[i] as number;
    if (!(di > 0 && di < dir.depth)) continue;
    const cj = di / k.beta1;
    if (cj < c && cj > cBelow) {
      cBelow = cj;
      below = i;
    } else if (cj > c && cj < cAbove) {
      cAbove = cj;
      above = i;
    }
  }
  around.below = below;
  around.above = above;
}

/** Branch of roots between two fixed displaced-concrete steps (bar indices, −1 = none). */
const br = { lo: -1, hi: -1, Pu: 0, theta: 0 };

function branchErr(alpha: number): number {
  const k = st.k as Kernel;
  const dir = k.scratchDir;
  setDirection(k, snapUnit(Math.sin(alpha)), snapUnit(Math.cos(alpha)), dir);
  const lo = br.lo >= 0 ? ((dir.d[br.lo] as number) / k.beta1) * (1 + 1e-10) : 0;
  const hi = br.hi >= 0 ? ((dir.d[br.hi] as number) / k.beta1) * (1 - 1e-10) : dir.cP0;
  if (!(lo < hi)) return Number.NaN;
  const flo = phiPnAt(k, dir, lo) - br.Pu;
  const fhi = phiPnAt(k, dir, hi) - br.Pu;
  if (flo < 0 === fhi < 0) return Number.NaN;
  const c = solveC(k, dir, br.Pu, lo, flo, hi, fhi);
  evaluate(k, dir, c, forcesOut);
  root.c = c;
  root.Pn = forcesOut[0] as number;
  root.Mx = forcesOut[1] as number;
  root.My = forcesOut[2] as number;
  root.epsT = forcesOut[3] as number;
  return wrapAngle(Math.atan2(root.My, root.Mx) - br.theta);
}

/** Follow the root branch containing depth c0 at α0 until its moment points along θ. */
function trackBranch(k: Kernel, Pu: number, theta: number, alpha0: number, c0: number): BiaxialCapacity | null {
  const dir = k.scratchDir;
  setDirection(k, snapUnit(Math.sin(alpha0)), snapUnit(Math.cos(alpha0)), dir);
  stepsAround(k, dir, c0);
  br.lo = around.below;
  br.hi = around.above;
  br.Pu = Pu;
  br.theta = theta;
  let a = alpha0;
  let fa = branchErr(a);
  if (Number.isNaN(fa)) return null;
  let b = a - fa / st.alphaSlope;
  let fb = branchErr(b);
  for (let iter = 0; iter < 30; iter++) {
    if (Number.isNaN(fb)) return null;
    if (Math.abs(fb) <= 1e-11) {
      const Mn = Math.hypot(root.Mx, root.My);
      const phi = phiOf(root.epsT, k.epsTy, k.phiC);
      return { phiMn: phi * Mn, Mn, phi, c: root.c, epsT: root.epsT, alpha: wrapAngle(b) };
    }
    const slope = (fb - fa) / (b - a);
    if (!(slope > 0.01) || !Number.isFinite(slope)) return null;
    a = b;
    fa = fb;
    b = b - fb / slope;
    fb = branchErr(b);
  }
  return null;
}

/**
 * Fallback when the local iteration does not converge: scan α round the full circle,
 * solve every bracket of the direction error, and keep the smallest capacity (§7.6,
 * several angles). When no neutral-axis angle gives a moment along θ at this Pu (the
 * capacity contour does not enclose that direction, e.g. a strongly unsymmetric section
 * near φPn,max), the capacity in that direction is zero.
 */
function scanAngles(k: Kernel, Pu: number, theta: number, tol: number): BiaxialCapacity {
  const steps = 72;
  let best: BiaxialCapacity | null = null;
  let pa = theta - Math.PI;
  st.guess = 0;
  let pe = errAt(pa);
  for (let i = 1; i <= steps; i++) {
    const ca = theta - Math.PI + (2 * Math.PI * i) / steps;
    const ce = errAt(ca);
    if (pe < 0 !== ce < 0 && Math.abs(ce - pe) < Math.PI) {
      const alpha = findRoot(errAt, pa, ca, pe, ce, 1e-13, tol);
      if (Math.abs(errAt(alpha)) <= 1e-6) {
        const cap = capacityAtAlpha(k, Pu, theta, alpha, Number.NaN);
        if (best === null || cap.phiMn < best.phiMn) best = cap;
      }
      st.guess = 0;
      pe = errAt(ca);
    } else pe = ce;
    pa = ca;
  }
  if (best !== null) return best;
  const none = capacityAtAlpha(k, Pu, theta, theta, Number.NaN);
  return { ...none, phiMn: 0, Mn: 0 };
}

function clampStep(step: number): number {
  return Math.max(-Math.PI / 4, Math.min(Math.PI / 4, step));
}

/** State of the current angle iteration (module level: no closure per call). */
const st = {
  k: null as Kernel | null, Pu: 0, theta: 0, guess: 0, degenerate: false, mScale: 0, lastAlpha: Number.NaN,
  /** the root c one step before (prevAlpha, prevC): extrapolating c in α halves the c error */
  prevAlpha: Number.NaN, prevC: 0,
  /** last slopes dθ/dα of the angle iteration and dφPn/dc of solveSingle (this call only) */
  alphaSlope: 1, slope: 0,
};

/** Angle between the nominal moment vector at neutral-axis angle α and the target θ. */
function errAt(alpha: number): number {
  const k = st.k as Kernel;
  const dir = k.scratchDir;
  setDirection(k, snapUnit(Math.sin(alpha)), snapUnit(Math.cos(alpha)), dir);
  let guess = st.guess;
  if (guess > 0 && st.prevC > 0 && Number.isFinite(st.prevAlpha) && st.prevAlpha !== st.lastAlpha) {
    // c moves smoothly with α: extrapolate along the last two solutions of this call
    const g = guess + ((alpha - st.lastAlpha) * (guess - st.prevC)) / (st.lastAlpha - st.prevAlpha);
    if (g > 0 && g < dir.cP0) guess = g;
  }
  solveSingle(k, dir, st.Pu, guess, root, st);
  st.prevAlpha = st.lastAlpha;
  st.prevC = st.guess;
  st.guess = root.c;
  st.lastAlpha = alpha;
  if (Math.hypot(root.Mx, root.My) <= st.mScale) {
    st.degenerate = true;
    return 0;
  }
  return wrapAngle(Math.atan2(root.My, root.Mx) - st.theta);
}
