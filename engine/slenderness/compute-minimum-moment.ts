/**
 * Minimum first-order moment M2,min = Pu (0.6 + 0.03 h), kip-in, with h in inches (6.6.4.5.4).
 *
 * @param Pu factored axial load, kip
 * @param h section dimension in the direction considered, in
 * @example computeMinimumMoment(300, 20) // 300 × 1.2 = 360 kip-in
 */
export function computeMinimumMoment(Pu: number, h: number): number {
  return Pu > 0 ? Pu * (0.6 + 0.03 * h) : 0;
}
