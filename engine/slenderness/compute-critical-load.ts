/**
 * Critical buckling load Pc = π² EIeff / (k ℓu)², kip (6.6.4.4.2).
 *
 * @param EI effective stiffness, kip-in²
 * @param k effective length factor
 * @param lu unbraced length, in
 * @example computeCriticalLoad(1.6e7, 1, 200) // π²·1.6e7/200² ≈ 3948 kip
 */
export function computeCriticalLoad(EI: number, k: number, lu: number): number {
  const kl = k * lu;
  return (Math.PI * Math.PI * EI) / (kl * kl);
}
