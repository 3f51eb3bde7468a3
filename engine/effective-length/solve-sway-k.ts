/**
 * Effective length factor of a sway (unbraced) column from the alignment-chart
 * equation, commentary to ACI 318-19 6.2.5 (Fig. R6.2.5.1):
 *
 *   (ψAψB(π/k)² − 36) / (6(ψA+ψB)) − (π/k)/tan(π/k) = 0,  k ≥ 1
 */

function swayResidual(u: number, psiA: number, psiB: number): number {
  return (psiA * psiB * u * u - 36) / (6 * (psiA + psiB)) - u / Math.tan(u);
}

/**
 * Solve the sway alignment-chart equation for k (bisection on u = π/k in (0, π)).
 *
 * @param psiA joint stiffness ratio ψ at end A (≥ 0, finite)
 * @param psiB ψ at end B
 * @returns k ≥ 1 (1.0 with both ends fixed, ψ = 0; grows without bound as both ψ → ∞)
 * @throws RangeError for a negative, NaN or infinite ψ (a sway column pinned at both ends is a mechanism)
 * @example solveSwayK(1, 1) // ≈ 1.317
 */
export function solveSwayK(psiA: number, psiB: number): number {
  for (const [psi, name] of [[psiA, "psiA"], [psiB, "psiB"]] as const) {
    if (typeof psi !== "number" || !Number.isFinite(psi) || psi < 0) {
      throw new RangeError(`${name} must be a finite number ≥ 0 (got ${String(psi)})`);
    }
  }
  if (psiA + psiB === 0) return 1;
  // residual → −36/(6(ψA+ψB)) − 1 < 0 as u → 0 and → +∞ as u → π
  let lo = 1e-12;
  let hi = Math.PI - 1e-12;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (swayResidual(mid, psiA, psiB) > 0) hi = mid;
    else lo = mid;
    if (hi - lo < 1e-15 * Math.PI) break;
  }
  return Math.PI / (0.5 * (lo + hi));
}
