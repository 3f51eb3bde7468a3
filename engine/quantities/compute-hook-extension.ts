/**
 * Straight extension of a 135° tie hook: 6 dtie, at least 3 in (25.3.2).
 *
 * @param dTie tie bar diameter, in
 * @example computeHookExtension(0.375) // 3 in
 */
export function computeHookExtension(dTie: number): number {
  return Math.max(6 * dTie, 3);
}
