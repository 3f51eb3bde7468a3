/**
 * Effective length factor of a braced (nonsway) column from the alignment-chart
 * (Jackson–Moreland) equation, commentary to ACI 318-19 6.2.5 (Fig. R6.2.5.1):
 *
 *   (ψAψB/4)(π/k)² + ((ψA+ψB)/2)(1 − (π/k)/tan(π/k)) + 2 tan(π/2k)/(π/k) − 1 = 0,  0.5 ≤ k ≤ 1
 */

function assertPsi(psi: number, name: string): void {
  if (typeof psi !== "number" || Number.isNaN(psi) || psi < 0) {
    throw new RangeError(`${name} must be a number ≥ 0 (got ${String(psi)})`);
  }
}

function bracedResidual(k: number, psiA: number, psiB: number): number {
  const u = Math.PI / k;
  return (psiA * psiB / 4) * u * u + ((psiA + psiB) / 2) * (1 - u / Math.tan(u)) + (2 * Math.tan(u / 2)) / u - 1;
}

/**
 * Solve the braced alignment-chart equation for k by bracketing and bisection.
 *
 * @param psiA joint stiffness ratio ψ at end A (≥ 0; Infinity = perfectly pinned)
 * @param psiB ψ at end B
 * @returns k, 0.5 (both ends fixed, ψ = 0) … 1.0 (both pinned, ψ → ∞)
 * @throws RangeError for a negative or NaN ψ
 * @example solveBracedK(1, 1) // ≈ 0.774
 */
export function solveBracedK(psiA: number, psiB: number): number {
  assertPsi(psiA, "psiA");
  assertPsi(psiB, "psiB");
  if (psiA === 0 && psiB === 0) return 0.5;
  if (psiA === Infinity && psiB === Infinity) return 1;
  // Very large ψ behaves as a pin; clamp so the products stay finite.
  const a = Math.min(psiA, 1e8);
  const b = Math.min(psiB, 1e8);
  // The residual is positive just above 0.5 and negative just below 1; scan for the
  // first sign change (the function is steep near k = 1 for large ψ) then bisect.
  const N = 400;
  let lo = 0.5 + 1e-9;
  let fLo = bracedResidual(lo, a, b);
  if (fLo <= 0) return 0.5;
  let hi = lo;
  let found = false;
  for (let i = 1; i <= N; i++) {
    const k = i === N ? 1 - 1e-12 : 0.5 + (0.5 * i) / N;
    const f = bracedResidual(k, a, b);
    if (f <= 0) {
      hi = k;
      found = true;
      break;
    }
    lo = k;
    fLo = f;
  }
  if (!found) return 1;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (bracedResidual(mid, a, b) > 0) lo = mid;
    else hi = mid;
    if (hi - lo < 1e-13) break;
  }
  return 0.5 * (lo + hi);
}
