import type { Axis, Curvature, EiOption } from "../types";
import { computeEndMomentRatio } from "./compute-end-moment-ratio";
import { computeSlendernessLimit } from "./compute-slenderness-limit";
import { computeCm } from "./compute-cm";
import { computeColumnInertia } from "./compute-effective-stiffness";
import { computeMinimumMoment } from "./compute-minimum-moment";

/**
 * Per-axis constants of a member, computed once per check (prepareAxis) so the per-case
 * chain is a handful of multiplications. Units: in, ksi, in⁴, kip.
 */
export interface AxisConstants {
  axis: Axis;
  /** effective length factor for k ℓu/r (sway k for sway columns) */
  k: number;
  /** unbraced length of one segment, in */
  lu: number;
  /** radius of gyration, in (6.2.5.2) */
  r: number;
  klur: number;
  braced: boolean;
  /** π² / (k ℓu)² with the k used in Pc (1.0 along the length of a sway column), 1/in² */
  pcFactor: number;
  transverse: boolean;
  option: EiOption;
  Ec: number;
  /** 0.4 Ec Ig (a) or 0.2 Ec Ig + Es Ise (b); unused for (c), kip-in² */
  EI0: number;
  Ig: number;
  rho: number;
  P0: number;
  /** section dimension in the direction considered, in */
  h: number;
}

/** Magnifier values of one variant (as given, or raised to M2,min). */
export interface ChainVariant {
  EI: number;
  Pc: number;
  Cm: number;
  /** δ, or NaN when unstable */
  delta: number;
  /** first-order moment used, kip-in */
  M2: number;
  /** magnified moment, kip-in (= M2 when unstable; check `unstable`) */
  Mc: number;
  unstable: boolean;
  /** Mc > 1.4 × the first-order moment (6.2.5.3) */
  capExceeded: boolean;
}

/** Result of the magnifier chain for one axis of one load case. */
export interface MagnifierChain {
  m1m2: number;
  klur: number;
  limit: number;
  slender: boolean;
  M2min: number;
  /** slender, Pu > 0 and M2 < M2,min: the raised variant applies */
  needsMinimum: boolean;
  given: ChainVariant;
  raised: ChainVariant;
}

/** A fresh chain record to be filled by runMagnifierChain. @example const chain = createMagnifierChain() */
export function createMagnifierChain(): MagnifierChain {
  return { m1m2: -1, klur: 0, limit: 0, slender: false, M2min: 0, needsMinimum: false, given: newVariant(), raised: newVariant() };
}

function newVariant(): ChainVariant {
  return { EI: 0, Pc: 0, Cm: 0, delta: 1, M2: 0, Mc: 0, unstable: false, capExceeded: false };
}

function fillVariant(
  ax: AxisConstants,
  v: ChainVariant,
  Pu: number,
  betaDns: number,
  M2: number,
  Cm: number,
  firstOrder: number,
): void {
  const EI =
    ax.option === "c"
      ? (ax.Ec * computeColumnInertia(ax.Ig, ax.rho, Pu, M2, ax.h, ax.P0)) / (1 + betaDns) // 6.6.4.4.4(c)
      : ax.EI0 / (1 + betaDns); // 6.6.4.4.4(a),(b)
  const Pc = EI * ax.pcFactor; // 6.6.4.4.2
  v.EI = EI;
  v.Pc = Pc;
  v.Cm = Cm;
  v.M2 = M2;
  const a = 1 - Pu / (0.75 * Pc); // 6.6.4.5.2
  if (!(a > 0)) {
    v.unstable = true;
    v.delta = NaN;
    v.Mc = M2;
    v.capExceeded = false;
    return;
  }
  const d = Cm / a;
  const delta = d < 1 ? 1 : d;
  v.unstable = false;
  v.delta = delta;
  v.Mc = delta * M2; // 6.6.4.5.1
  // 6.2.5.3: second-order moment ≤ 1.4 × first-order moment (tiny tolerance for round-off)
  v.capExceeded = v.Mc > 1.4 * firstOrder * (1 + 1e-12) + 1e-12;
}

/**
 * Run the nonsway moment-magnifier chain for one axis (6.2.5.1, 6.6.4.4–6.6.4.5): the
 * signed M1/M2, k ℓu/r and its limit, and — when slender — EI, Pc, Cm, δ and Mc, both as
 * given and with the first-order moment raised to M2,min = Pu(0.6 + 0.03h) (Cm = 1.0).
 * An axis whose slenderness may be neglected gets δ = 1 and Mc = M2 (column-checks.md §7.1).
 *
 * @param ax per-axis constants (see AxisConstants)
 * @param Pu factored axial load, kip
 * @param betaDns sustained-load ratio βdns (6.6.4.4.4)
 * @param M1 smaller end moment magnitude, kip-in
 * @param M2 larger end moment magnitude, kip-in
 * @param curvature "single" | "double"
 * @param firstOrderM2 first-order moment for the 1.4 cap (= M2 for braced columns;
 *   Mns + Ms for sway columns), kip-in
 * @param out record to fill (no allocation)
 * @example runMagnifierChain(ax, 310, 0.55, 700, 1450, "single", 1450, createMagnifierChain())
 */
export function runMagnifierChain(
  ax: AxisConstants,
  Pu: number,
  betaDns: number,
  M1: number,
  M2: number,
  curvature: Curvature,
  firstOrderM2: number,
  out: MagnifierChain,
): MagnifierChain {
  const m1m2 = computeEndMomentRatio(M1, M2, curvature);
  const limit = computeSlendernessLimit(ax.braced, m1m2);
  out.m1m2 = m1m2;
  out.klur = ax.klur;
  out.limit = limit;
  out.slender = ax.klur > limit;
  const g = out.given;
  if (!out.slender) {
    out.M2min = 0;
    out.needsMinimum = false;
    g.EI = NaN;
    g.Pc = NaN;
    g.Cm = NaN;
    g.delta = 1;
    g.M2 = M2;
    g.Mc = M2;
    g.unstable = false;
    g.capExceeded = false;
    return out;
  }
  const M2min = computeMinimumMoment(Pu, ax.h);
  out.M2min = M2min;
  fillVariant(ax, g, Pu, betaDns, M2, computeCm(m1m2, ax.transverse), firstOrderM2);
  out.needsMinimum = M2 < M2min;
  // 6.6.4.5.4: where M2,min governs, Cm = 1.0 (column-checks.md §3)
  if (out.needsMinimum) fillVariant(ax, out.raised, Pu, betaDns, M2min, 1, M2min > firstOrderM2 ? M2min : firstOrderM2);
  return out;
}
