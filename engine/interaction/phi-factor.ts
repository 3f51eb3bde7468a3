import { ES, EPS_CU } from "../materials";
import type { Confinement } from "../types";

/**
 * Strength reduction factor φ for moment, axial force, or combined moment and axial
 * force (Table 21.2.2), from the net tensile strain εt in the extreme tension layer:
 * εt ≤ εty → 0.65 (tied) / 0.75 (spiral); εt ≥ εty + 0.003 → 0.90; linear between,
 * with εty = fy / Es (21.2.2.1, Es = 29 000 ksi).
 *
 * @param epsT net tensile strain εt (positive = tension; compression is negative)
 * @param fy yield strength of the longitudinal bars, ksi (> 0)
 * @param confinement "tied" or "spiral"
 * @returns φ, between 0.65/0.75 and 0.90
 * @throws RangeError for non-finite epsT or non-positive fy
 * @example phiFactor(0.005, 60, "tied") // 0.9 (0.005 ≥ 0.00207 + 0.003)
 */
export function phiFactor(epsT: number, fy: number, confinement: Confinement): number {
  if (Number.isNaN(epsT)) throw new RangeError("epsT must be a number");
  if (!(fy > 0) || !Number.isFinite(fy)) throw new RangeError(`fy must be a positive finite number (got ${fy})`);
  if (confinement !== "tied" && confinement !== "spiral") {
    throw new TypeError(`confinement must be "tied" or "spiral" (got ${JSON.stringify(confinement)})`);
  }
  return phiOf(epsT, fy / ES, confinement === "spiral" ? 0.75 : 0.65);
}

/** Unchecked kernel of {@link phiFactor} (hot loop). @internal */
export function phiOf(epsT: number, epsTy: number, phiC: number): number {
  if (epsT <= epsTy) return phiC;
  if (epsT >= epsTy + EPS_CU) return 0.9;
  return phiC + ((0.9 - phiC) * (epsT - epsTy)) / EPS_CU;
}
