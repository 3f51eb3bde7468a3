import type { MomentCapacity, ResolvedSection } from "../types";
import { phiMnAt, phiMnValueAt } from "./phi-mn-at";
import { halfPitchOf, kernelOf } from "./section-kernel";

/**
 * Design moment strength of a circular section at Pu, used in every moment direction
 * with the resultant moment √(Mx² + My²) (column-checks.md §7.5): the smaller of the
 * layout as given (bending about x, both senses when the layout is not symmetric) and
 * the layout turned by half the bar pitch, π/n.
 *
 * @param section a resolved circular section
 * @param Pu factored axial load, kip (compression +)
 * @returns the governing capacity, or null when Pu > φPn,max or Pu < −0.9 Pnt
 * @throws RangeError for a non-circular section or non-finite Pu
 * @example circleCapacityAt(resolveSection({ shape: "circle", D: 20, ... }), 300)?.phiMn
 */
export function circleCapacityAt(section: ResolvedSection, Pu: number): MomentCapacity | null {
  if (section.shape !== "circle") throw new RangeError("circleCapacityAt needs a circular section");
  const k = kernelOf(section);
  const asGiven = phiMnAt(section, "x", Pu);
  if (asGiven === null) return null;
  const turned = phiMnAt(halfPitchOf(k), "x", Pu);
  if (turned === null) return asGiven;
  return turned.phiMn < asGiven.phiMn ? turned : asGiven;
}

/**
 * circleCapacityAt(...).phiMn as a number, without building results (the member check
 * needs the number once per load case); −1 when Pu is outside −0.9 Pnt … φPn,max. @internal
 * @example circleCapacityValueAt(section, 300) // kip-in
 */
export function circleCapacityValueAt(section: ResolvedSection, Pu: number): number {
  if (section.shape !== "circle") throw new RangeError("circleCapacityValueAt needs a circular section");
  const asGiven = phiMnValueAt(section, "x", Pu);
  if (asGiven < 0) return -1;
  const turned = phiMnValueAt(halfPitchOf(kernelOf(section)), "x", Pu);
  return turned >= 0 && turned < asGiven ? turned : asGiven;
}
