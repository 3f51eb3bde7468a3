/**
 * Equivalent uniform moment factor Cm (6.6.4.5.3): 0.6 − 0.4 (M1/M2) for a column
 * without transverse load between supports (a), 1.0 with transverse load (b).
 *
 * @param m1m2 signed M1/M2 (negative in single curvature)
 * @param transverseLoad true when transverse load acts between the supports
 * @example computeCm(-0.5, false) // 0.8
 */
export function computeCm(m1m2: number, transverseLoad: boolean): number {
  return transverseLoad ? 1 : 0.6 - 0.4 * m1m2;
}
