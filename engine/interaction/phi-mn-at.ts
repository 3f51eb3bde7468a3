import type { Axis, MomentCapacity, ResolvedSection } from "../types";
import { PHI_TENSION, axialInRange, evaluate, kernelOf, newRoot, solveScan, uniScan, type Kernel } from "./section-kernel";
import { phiOf } from "./phi-factor";

const root = newRoot();
const tensionOut = new Float64Array(4);
/** projection of (Mx, My) on the sense direction, per uniaxial index */
const PX = [1, 0, -1, 0] as const;
const PY = [0, 1, 0, -1] as const;

/** Result of the last uniaxial solve (module level: the number-only path allocates nothing). */
const last = { phiMn: 0, Mn: 0, phi: 0, c: 0, epsT: 0 };

/** Solve one uniaxial direction index (0 +x, 1 +y, 2 −x, 3 −y) into `last`. */
function solveUni(k: Kernel, idx: 0 | 1 | 2 | 3, Pu: number): void {
  const px = PX[idx];
  const py = PY[idx];
  if (Pu <= -PHI_TENSION * k.Pnt) {
    // exactly the pure-tension strength: c = 0, every bar at −fy
    evaluate(k, uniScan(k, idx).dir, 0, tensionOut);
    const Mn = Math.max(0, (tensionOut[1] as number) * px + (tensionOut[2] as number) * py);
    last.phiMn = PHI_TENSION * Mn;
    last.Mn = Mn;
    last.phi = PHI_TENSION;
    last.c = 0;
    last.epsT = tensionOut[3] as number;
    return;
  }
  solveScan(k, uniScan(k, idx), Pu, px, py, root);
  if (Number.isNaN(root.c)) {
    // cannot happen for −0.9 Pnt < Pu ≤ φPn,max (φPn runs continuously from −0.9 Pnt up
    // to 0.65/0.75 P0 apart from downward steps); kept as a guard against silent zeros
    throw new Error("phiMnAt: no neutral-axis depth satisfies φPn = Pu");
  }
  const Mn = Math.max(0, root.Mx * px + root.My * py);
  const phi = phiOf(root.epsT, k.epsTy, k.phiC);
  last.phiMn = phi * Mn;
  last.Mn = Mn;
  last.phi = phi;
  last.c = root.c;
  last.epsT = root.epsT;
}

/** Capacity in one uniaxial direction index (0 +x, 1 +y, 2 −x, 3 −y). @internal */
export function capacityUni(k: Kernel, idx: 0 | 1 | 2 | 3, Pu: number): MomentCapacity {
  solveUni(k, idx, Pu);
  return { phiMn: last.phiMn, Mn: last.Mn, phi: last.phi, c: last.c, epsT: last.epsT };
}

/**
 * φMn about one axis at Pu as a number, the smaller of both senses for a section not
 * symmetric about the axis — the value phiMnAt(...).phiMn gives, without building a result
 * (the member check needs only the number, twice per load case). −1 when Pu is outside
 * −0.9 Pnt … φPn,max. @internal
 * @example phiMnValueAt(section, "x", 310) // kip-in
 */
export function phiMnValueAt(section: ResolvedSection, axis: Axis, Pu: number): number {
  const k = kernelOf(section);
  if (!axialInRange(k, Pu)) return -1;
  solveUni(k, axis === "x" ? 0 : 1, Pu);
  const a = last.phiMn;
  if (axis === "x" ? k.symAboutX : k.symAboutY) return a;
  solveUni(k, axis === "x" ? 2 : 3, Pu);
  return last.phiMn < a ? last.phiMn : a;
}

/**
 * Design moment strength φMn (kip-in) about one axis at a factored axial load Pu
 * (kip, compression positive), by strain compatibility (22.2) with φ from Table 21.2.2.
 *
 * The neutral axis is parallel to the axis (§7.4). `sense` 1 compresses the +y face
 * (axis "x") or the +x face (axis "y"); −1 the opposite face. Without `sense`, a
 * section not symmetric about the axis is checked in both senses and the smaller
 * capacity is returned (§7.3).
 *
 * The depth c is found by root-finding φPn(c) = Pu (Brent, |φPn − Pu| ≤ 1e-11 P0) on
 * every bracket of a cached per-section scan of φPn(c) whose grid includes the
 * displaced-concrete steps (c = d/β1 for each bar) and the φ transition ends; where
 * several depths satisfy φPn = Pu, the smallest moment governs (§7.6).
 * Returned Mn and φMn are clamped at ≥ 0 (a negative value means the section cannot
 * resist a moment in that sense at Pu).
 *
 * @param section from resolveSection (treated as immutable: per-section arrays are cached)
 * @param axis "x" (moment Mx, depth h) or "y" (moment My, depth b)
 * @param Pu factored axial load, kip (compression +, tension −)
 * @param sense 1 or −1, optional
 * @returns the capacity, or null when Pu > φPn,max (Table 22.4.2.1) or Pu < −0.9 Pnt (22.4.3.1)
 * @throws RangeError for a non-finite Pu or a bad sense; TypeError for a bad axis
 * @example phiMnAt(section, "x", 310)?.phiMn // kip-in
 */
export function phiMnAt(section: ResolvedSection, axis: Axis, Pu: number, sense?: 1 | -1): MomentCapacity | null {
  if (axis !== "x" && axis !== "y") throw new TypeError(`axis must be "x" or "y" (got ${JSON.stringify(axis)})`);
  if (sense !== undefined && sense !== 1 && sense !== -1) throw new RangeError(`sense must be 1 or -1 (got ${String(sense)})`);
  const k = kernelOf(section);
  if (!axialInRange(k, Pu)) return null;
  const pos: 0 | 1 = axis === "x" ? 0 : 1;
  const neg: 2 | 3 = axis === "x" ? 2 : 3;
  if (sense === 1) return capacityUni(k, pos, Pu);
  if (sense === -1) return capacityUni(k, neg, Pu);
  const a = capacityUni(k, pos, Pu);
  if (axis === "x" ? k.symAboutX : k.symAboutY) return a;
  const b = capacityUni(k, neg, Pu);
  return b.phiMn < a.phiMn ? b : a;
}
