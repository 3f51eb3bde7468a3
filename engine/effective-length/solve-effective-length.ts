import { solveBracedK } from "./solve-braced-k";
import { solveSwayK } from "./solve-sway-k";

/**
 * Effective length factor k from the joint stiffness ratios at both ends, braced or
 * sway (alignment-chart equations, commentary R6.2.5).
 *
 * @param psiA ψ at end A (≥ 0)
 * @param psiB ψ at end B (≥ 0)
 * @param sway true for a sway (unbraced) column
 * @returns k (dimensionless)
 * @throws RangeError for invalid ψ
 * @example solveEffectiveLength(1, 1, true) // ≈ 1.317
 */
export function solveEffectiveLength(psiA: number, psiB: number, sway: boolean): number {
  return sway ? solveSwayK(psiA, psiB) : solveBracedK(psiA, psiB);
}
