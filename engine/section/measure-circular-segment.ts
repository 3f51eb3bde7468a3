/**
 * Exact area and centroid of a circular segment (the part of a circle of radius R
 * beyond a chord at depth `a` from the extreme fibre). Closed-form geometry, no strips.
 *
 * With the half-angle φ of the chord, cos φ = (R − a)/R:
 *   A = R² (φ − sin φ cos φ),  ȳ = 2 R³ sin³φ / (3 A)  measured from the centre
 * toward the extreme fibre (a standard result of plane geometry).
 *
 * @param R radius, in (> 0)
 * @param a segment depth, in; clamped to [0, 2R]
 * @param out optional 2-element array to fill with [area in², centroid distance from centre in]
 * @returns [area, centroid distance from centre]
 * @example measureCircularSegment(10, 10) // [π·100/2, 4·10/(3π)] (half disc)
 */
export function measureCircularSegment(R: number, a: number, out: Float64Array = new Float64Array(2)): Float64Array {
  if (!(R > 0) || !Number.isFinite(R)) throw new RangeError(`R must be a positive finite number (got ${R})`);
  if (!(a > 0)) {
    out[0] = 0;
    out[1] = R;
    return out;
  }
  if (a >= 2 * R) {
    out[0] = Math.PI * R * R;
    out[1] = 0;
    return out;
  }
  segmentInto(R, a, out);
  return out;
}

/**
 * Unchecked kernel of {@link measureCircularSegment} for 0 < a < 2R (hot loop).
 * @internal
 */
export function segmentInto(R: number, a: number, out: Float64Array): void {
  const cosPhi = (R - a) / R;
  const phi = Math.acos(cosPhi);
  const sinPhi = Math.sqrt(Math.max(0, 1 - cosPhi * cosPhi));
  const area = R * R * (phi - sinPhi * cosPhi);
  out[0] = area;
  out[1] = area > 0 ? (2 * R * R * R * sinPhi * sinPhi * sinPhi) / (3 * area) : R;
}
