/**
 * Nonsway moment magnifier δ = Cm / (1 − Pu/(0.75 Pc)) ≥ 1.0 (6.6.4.5.2).
 * Pu ≥ 0.75 Pc means the column is unstable: the result is null.
 *
 * @param Cm equivalent uniform moment factor
 * @param Pu factored axial load, kip
 * @param Pc critical buckling load, kip
 * @returns δ ≥ 1, or null when unstable
 * @example computeMomentMagnifier(0.8, 300, 2000) // 0.8/(1 − 0.2) = 1.0
 */
export function computeMomentMagnifier(Cm: number, Pu: number, Pc: number): number | null {
  const a = 1 - Pu / (0.75 * Pc);
  if (!(a > 0)) return null;
  const d = Cm / a;
  return d < 1 ? 1 : d;
}
