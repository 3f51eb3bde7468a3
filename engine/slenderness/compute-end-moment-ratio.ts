import type { Curvature } from "../types";

/**
 * The code's signed end-moment ratio M1/M2 from magnitudes and curvature
 * (column-checks.md §3; sign per 6.6.4.5.3: negative in single curvature).
 * With no end moment (M2 = 0) the ratio is taken as −1 (column-checks.md §7.2).
 *
 * @param M1 smaller end moment magnitude, kip-in (≥ 0)
 * @param M2 larger end moment magnitude, kip-in (≥ M1)
 * @param curvature "single" or "double"
 * @returns M1/M2 in [−1, 1]
 * @example computeEndMomentRatio(700, 1450, "single") // −0.4828
 */
export function computeEndMomentRatio(M1: number, M2: number, curvature: Curvature): number {
  if (!(M2 > 0)) return -1;
  const r = Math.abs(M1) / Math.abs(M2);
  return curvature === "single" ? -r : r;
}
