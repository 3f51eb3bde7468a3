/**
 * Largest k ℓu/r for which slenderness may be neglected (6.2.5.1):
 * sway columns 22 (a); braced columns 34 + 12 (M1/M2) (b), and at most 40 (c).
 *
 * @param braced true for a nonsway column
 * @param m1m2 signed M1/M2 (negative in single curvature)
 * @returns the limit (dimensionless)
 * @example computeSlendernessLimit(true, -0.5) // 28
 */
export function computeSlendernessLimit(braced: boolean, m1m2: number): number {
  if (!braced) return 22;
  const l = 34 + 12 * m1m2;
  return l > 40 ? 40 : l;
}
