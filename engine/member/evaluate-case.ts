import { phiMnAtAngle } from "../interaction";
import { circleCapacityValueAt } from "../interaction/circle-capacity-at";
import { phiMnValueAt } from "../interaction/phi-mn-at";
import { computeSegmentEndMoments, type SegmentEndMoments } from "../slenderness/compute-segment-end-moments";
import {
  createMagnifierChain,
  runMagnifierChain,
  type AxisConstants,
  type ChainVariant,
  type MagnifierChain,
} from "../slenderness/run-magnifier-chain";
import type { Axis, EndMoments, LoadCase } from "../types";
import type { PreparedMember, SwayAxisState } from "./prepare-member";

/**
 * Why a case failed outright (utilization = ∞): "axial" Pu > φPn,max (Table 22.4.2.1) or
 * tension beyond φPnt (22.4.3.1); "unstable" Pu ≥ 0.75 Pc (6.6.4.5.2); "cap" Mc > 1.4 ×
 * first-order moment (6.2.5.3); "sway" sway data missing or δs not usable (6.6.4.6);
 * "no-capacity" no moment strength at Pu although Mc > 0.
 */
export type Failure = "none" | "axial" | "unstable" | "cap" | "sway" | "no-capacity";

/** Variant of the M2,min rule (column-checks.md §7.1): as given, x raised, or y raised. */
export type Variant = "given" | "raise-x" | "raise-y";

/** Reusable working storage for one load-case evaluation (no allocation per case). */
export interface CaseScratch {
  chainX: MagnifierChain;
  chainY: MagnifierChain;
  seg: SegmentEndMoments;
  /** φMn about x / y at the case's Pu, kip-in (NaN = not computed yet, −1 = none) */
  capX: number;
  capY: number;
  /** circle capacity at Pu, kip-in (NaN = not computed) */
  capCircle: number;
  /** Pu the capacities belong to */
  capPu: number;
  utilization: number;
  segment: number;
  variant: Variant;
  failure: Failure;
  failAxis: Axis | null;
  /** biaxial governing: capacity in the moment direction and θ (rad), else NaN */
  biaxialCap: number;
  theta: number;
  /** sway error text of the failing axis */
  swayError: string | null;
  // per-variant outputs (internal)
  vFail: Failure;
  vAxis: Axis | null;
  vBiCap: number;
  vTheta: number;
  /** moment part of the variant's utilization (before the Pu/φPn,max term), for tie-breaking */
  vRatio: number;
  /** segment whose values the chains hold (−1: none for this case) */
  chainSegment: number;
  /** one-entry cache of the last biaxial capacity: Mcy/Mcx and Pu */
  vThetaKey: number;
  lastAngleCap: number;
}

/** Fresh scratch storage. @example const s = createCaseScratch(); evaluateCase(prep, load, s) */
export function createCaseScratch(): CaseScratch {
  return {
    chainX: createMagnifierChain(),
    chainY: createMagnifierChain(),
    seg: { M1: 0, M2: 0, curvature: "single" },
    capX: NaN,
    capY: NaN,
    capCircle: NaN,
    capPu: NaN,
    utilization: 0,
    segment: 0,
    variant: "given",
    failure: "none",
    failAxis: null,
    biaxialCap: NaN,
    theta: NaN,
    swayError: null,
    vFail: "none",
    vAxis: null,
    vBiCap: NaN,
    vTheta: NaN,
    vRatio: 0,
    vThetaKey: NaN,
    lastAngleCap: NaN,
    chainSegment: -1,
  };
}

const ZERO_MOMENTS: EndMoments = { M1: 0, M2: 0, curvature: "double" };

/**
 * Run the chain for one axis and segment: sway magnification of the end moments
 * (M = Mns + δs Ms, 6.6.4.6.1), the segment's end moments off the linear moment line
 * (§7.8), then the nonsway magnifier (moments kip-in, Pu kip). Returns false when the sway
 * state forbids a check.
 *
 * @example runAxis(prep, prep.x, prep.swayX, load.Mx, load.Pu, load.betaDns, 0, seg, chain)
 */
export function runAxis(
  prep: PreparedMember,
  ax: AxisConstants,
  sway: SwayAxisState | null,
  em: EndMoments | undefined,
  Pu: number,
  betaDns: number,
  segment: number,
  seg: SegmentEndMoments,
  out: MagnifierChain,
): boolean {
  const m = em ?? ZERO_MOMENTS;
  let M1 = m.M1;
  let M2 = m.M2;
  let first = M2;
  if (sway !== null) {
    const m1s = m.M1s ?? 0;
    const m2s = m.M2s ?? 0;
    if (sway.error !== null) {
      // still fill the chain with first-order values for display
      M1 += m1s;
      M2 += m2s;
      if (M1 > M2) [M1, M2] = [M2, M1];
      runMagnifierChain(ax, Pu, betaDns, M1, M2, m.curvature, M2, out);
      return false;
    }
    const d = sway.deltaS;
    const e1 = M1 + d * m1s;
    const e2 = M2 + d * m2s;
    first = Math.max(M1 + m1s, M2 + m2s);
    M1 = e1 < e2 ? e1 : e2;
    M2 = e1 < e2 ? e2 : e1;
    runMagnifierChain(ax, Pu, betaDns, M1, M2, m.curvature, first, out);
    return true;
  }
  computeSegmentEndMoments(M1, M2, m.curvature, prep.braceLevels, segment, seg);
  runMagnifierChain(ax, Pu, betaDns, seg.M1, seg.M2, seg.curvature, seg.M2, out);
  return true;
}

/**
 * φMn about x at Pu (cached in the scratch), kip-in; −1 when Pu is outside the axial range.
 * Circles use circleCapacityValueAt (§7.5). @example capacityX(prep, s, 300) // 4942
 */
export function capacityX(prep: PreparedMember, s: CaseScratch, Pu: number): number {
  if (prep.circle) return capacityCircle(prep, s, Pu);
  if (Number.isNaN(s.capX)) {
    s.capX = phiMnValueAt(prep.section, "x", Pu);
  }
  return s.capX;
}

/** φMn about y at Pu (cached), kip-in; −1 when none. @example capacityY(prep, s, 300) */
export function capacityY(prep: PreparedMember, s: CaseScratch, Pu: number): number {
  if (prep.circle) return capacityCircle(prep, s, Pu);
  if (Number.isNaN(s.capY)) {
    s.capY = phiMnValueAt(prep.section, "y", Pu);
  }
  return s.capY;
}

function capacityCircle(prep: PreparedMember, s: CaseScratch, Pu: number): number {
  if (Number.isNaN(s.capCircle)) s.capCircle = circleCapacityValueAt(prep.section, Pu);
  return s.capCircle;
}

/** Capacity in the direction of the resultant (Mx, My) = (a, b) ≥ 0, worst sense where the section is unsymmetric (§7.3). */
function capacityAtDirection(prep: PreparedMember, Pu: number, a: number, b: number): number {
  const sec = prep.section;
  const theta = Math.atan2(b, a);
  let cap = capAngle(sec, Pu, theta);
  if (!prep.symAboutX) cap = Math.min(cap, capAngle(sec, Pu, Math.PI - theta));
  if (!prep.symAboutY) cap = Math.min(cap, capAngle(sec, Pu, -theta));
  if (!prep.symAboutX && !prep.symAboutY) cap = Math.min(cap, capAngle(sec, Pu, theta - Math.PI));
  return cap;
}

function capAngle(sec: PreparedMember["section"], Pu: number, theta: number): number {
  const c = phiMnAtAngle(sec, Pu, theta);
  return c === null ? -1 : c.phiMn;
}

function ratioOf(Mc: number, cap: number): number {
  if (!(Mc > 0)) return 0;
  return cap > 0 ? Mc / cap : Infinity;
}

/** Utilization of one M2,min variant; sets s.vFail / s.vAxis / s.vBiCap / s.vTheta. */
function variantUtilization(
  prep: PreparedMember,
  s: CaseScratch,
  vx: ChainVariant,
  vy: ChainVariant,
  slenderX: boolean,
  slenderY: boolean,
  Pu: number,
  axial: number,
): number {
  s.vBiCap = NaN;
  s.vTheta = NaN;
  s.vAxis = null;
  if (slenderX && vx.unstable) return fail(s, "unstable", "x");
  if (slenderY && vy.unstable) return fail(s, "unstable", "y");
  if (slenderX && vx.capExceeded) return fail(s, "cap", "x");
  if (slenderY && vy.capExceeded) return fail(s, "cap", "y");
  const Mcx = vx.Mc;
  const Mcy = vy.Mc;
  let ratio: number;
  if (Mcx > 0 && Mcy > 0) {
    // §7.4 biaxial: capacity in the direction of the resultant moment (§7.5 for circles)
    let cap: number;
    if (prep.circle) cap = capacityCircle(prep, s, Pu);
    else if (s.capPu === Pu && s.vThetaKey === Mcy / Mcx) cap = s.lastAngleCap;
    else {
      cap = capacityAtDirection(prep, Pu, Mcx, Mcy);
      s.capPu = Pu;
      s.vThetaKey = Mcy / Mcx;
      s.lastAngleCap = cap;
    }
    s.vBiCap = cap;
    s.vTheta = Math.atan2(Mcy, Mcx);
    ratio = ratioOf(Math.hypot(Mcx, Mcy), cap);
    if (ratio === Infinity) return fail(s, "no-capacity", null);
  } else {
    const rx = Mcx > 0 ? ratioOf(Mcx, capacityX(prep, s, Pu)) : 0;
    const ry = Mcy > 0 ? ratioOf(Mcy, capacityY(prep, s, Pu)) : 0;
    if (rx === Infinity) return fail(s, "no-capacity", "x");
    if (ry === Infinity) return fail(s, "no-capacity", "y");
    ratio = rx > ry ? rx : ry;
  }
  s.vFail = "none";
  s.vRatio = ratio;
  return ratio > axial ? ratio : axial;
}

function fail(s: CaseScratch, f: Failure, axis: Axis | null): number {
  s.vFail = f;
  s.vRatio = Infinity;
  s.vAxis = axis;
  return Infinity;
}

/**
 * Evaluate one load case: every segment (§7.8), both axes (§7.1), the M2,min variants one
 * axis at a time (§7.1), uniaxial or biaxial capacity (§7.4, §7.5); the worst governs.
 * Fills the scratch with the governing segment and variant.
 *
 * @returns the case utilization (Infinity when the case fails outright: unstable, over the
 *   1.4 cap, Pu outside the axial range, sway data missing)
 * @example evaluateCase(prepareMember(sec, member), load, createCaseScratch()) // 0.87
 */
export function evaluateCase(prep: PreparedMember, load: LoadCase, s: CaseScratch): number {
  const sec = prep.section;
  const Pu = load.Pu;
  s.capX = NaN;
  s.capY = NaN;
  s.capCircle = NaN;
  s.capPu = NaN;
  s.segment = 0;
  s.variant = "given";
  s.failAxis = null;
  s.biaxialCap = NaN;
  s.theta = NaN;
  s.swayError = null;
  s.chainSegment = -1;
  // Table 22.4.2.1: Pu may not exceed φPn,max; 22.4.3.1: nor tension beyond φ Pnt
  if (!(Pu <= sec.phiPnMax) || !(Pu >= -0.9 * sec.Pnt)) {
    s.failure = "axial";
    s.utilization = Infinity;
    return Infinity;
  }
  const axial = Pu / sec.phiPnMax;
  let best = -Infinity;
  let bestFail: Failure = "none";
  let bestAxis: Axis | null = null;
  // ties (e.g. Pu/φPn,max governing every segment) go to the larger moment ratio
  let bestRatio = -Infinity;
  for (let seg = 0; seg < prep.segments; seg++) {
    const okX = runAxis(prep, prep.x, prep.swayX, load.Mx, Pu, load.betaDns, seg, s.seg, s.chainX);
    const okY = runAxis(prep, prep.y, prep.swayY, load.My, Pu, load.betaDns, seg, s.seg, s.chainY);
    s.chainSegment = seg;
    if (!okX || !okY) {
      const st = !okX ? prep.swayX : prep.swayY;
      s.swayError = st === null ? null : st.error;
      s.failure = "sway";
      s.failAxis = !okX ? "x" : "y";
      s.utilization = Infinity;
      return Infinity;
    }
    const cx = s.chainX;
    const cy = s.chainY;
    if (!cx.needsMinimum && !cy.needsMinimum) {
      const u = variantUtilization(prep, s, cx.given, cy.given, cx.slender, cy.slender, Pu, axial);
      if (u > best || (u === best && s.vRatio > bestRatio)) {
        take(s, seg, "given");
        bestRatio = s.vRatio;
        best = u;
        bestFail = s.vFail;
        bestAxis = s.vAxis;
      }
    } else {
      if (cx.needsMinimum) {
        const u = variantUtilization(prep, s, cx.raised, cy.given, true, cy.slender, Pu, axial);
        if (u > best || (u === best && s.vRatio > bestRatio)) {
          take(s, seg, "raise-x");
          bestRatio = s.vRatio;
          best = u;
          bestFail = s.vFail;
          bestAxis = s.vAxis;
        }
      }
      if (cy.needsMinimum) {
        const u = variantUtilization(prep, s, cx.given, cy.raised, cx.slender, true, Pu, axial);
        if (u > best || (u === best && s.vRatio > bestRatio)) {
          take(s, seg, "raise-y");
          bestRatio = s.vRatio;
          best = u;
          bestFail = s.vFail;
          bestAxis = s.vAxis;
        }
      }
    }
    if (best === Infinity) break;
  }
  s.failure = bestFail;
  s.failAxis = bestAxis;
  s.utilization = best;
  return best;
}

function take(s: CaseScratch, seg: number, v: Variant): void {
  s.segment = seg;
  s.variant = v;
  s.biaxialCap = s.vBiCap;
  s.theta = s.vTheta;
}
