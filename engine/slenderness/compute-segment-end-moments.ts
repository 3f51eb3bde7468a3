import type { Curvature } from "../types";

/** End moments of one segment: magnitudes M1 ≤ M2 and curvature. */
export interface SegmentEndMoments {
  M1: number;
  M2: number;
  curvature: Curvature;
}

/**
 * End moments of segment `segment` (0 = bottom) when `braceLevels` intermediate braces
 * split the unbraced length into braceLevels + 1 equal parts. The first-order moment
 * varies linearly from the M1 end (bottom) to the M2 end (top) (column-checks.md §3, §7.8);
 * in double curvature the bottom moment has the opposite sign.
 *
 * @param M1 smaller end moment magnitude of the whole column, kip-in
 * @param M2 larger end moment magnitude, kip-in
 * @param curvature of the whole column
 * @param braceLevels number of intermediate brace levels n (≥ 0)
 * @param segment 0 … n
 * @param out optional object to fill (avoids an allocation in hot loops)
 * @example computeSegmentEndMoments(700, 1450, "single", 1, 1) // { M1: 1075, M2: 1450, curvature: "single" }
 */
export function computeSegmentEndMoments(
  M1: number,
  M2: number,
  curvature: Curvature,
  braceLevels: number,
  segment: number,
  out: SegmentEndMoments = { M1: 0, M2: 0, curvature: "single" },
): SegmentEndMoments {
  if (braceLevels === 0) {
    out.M1 = M1;
    out.M2 = M2;
    out.curvature = curvature;
    return out;
  }
  const bottom = curvature === "single" ? M1 : -M1;
  const n = braceLevels + 1;
  const a = bottom + ((M2 - bottom) * segment) / n;
  const b = bottom + ((M2 - bottom) * (segment + 1)) / n;
  const aa = Math.abs(a);
  const ab = Math.abs(b);
  out.M1 = aa < ab ? aa : ab;
  out.M2 = aa < ab ? ab : aa;
  // opposite signs at the two ends: the segment bends in double curvature
  out.curvature = a * b < 0 ? "double" : "single";
  return out;
}
