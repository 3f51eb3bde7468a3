/**
 * Exact area and centroid of the part of a rectangle on the compression side of a
 * straight line: the rectangle [−b/2, b/2] × [−h/2, h/2] clipped by the half-plane
 * x·ux + y·uy ≥ tCut (Sutherland–Hodgman clipping by one edge, then the shoelace
 * formula for area and centroid).
 *
 * @param halfB b/2, in
 * @param halfH h/2, in
 * @param ux x component of the unit vector pointing to the compression side
 * @param uy y component of that unit vector
 * @param tCut position of the block's inner edge along (ux, uy), in
 * @param out optional 3-element array filled with [area in², xc in, yc in]
 * @returns out
 * @example clipRectangleBlock(9, 11, 0, 1, 11 - 4) // [18·4, 0, 9] — a 4 in deep block on the +y face
 */
export function clipRectangleBlock(
  halfB: number,
  halfH: number,
  ux: number,
  uy: number,
  tCut: number,
  out: Float64Array = new Float64Array(3),
): Float64Array {
  // corners anticlockwise: (b,h) (−b,h) (−b,−h) (b,−h); signed distances to the cut line
  const d0 = halfB * ux + halfH * uy - tCut;
  const d1 = -halfB * ux + halfH * uy - tCut;
  const d2 = -halfB * ux - halfH * uy - tCut;
  const d3 = halfB * ux - halfH * uy - tCut;
  st.n = 0;
  st.a2 = 0;
  st.cx = 0;
  st.cy = 0;
  clipEdge(halfB, halfH, d0, -halfB, halfH, d1);
  clipEdge(-halfB, halfH, d1, -halfB, -halfH, d2);
  clipEdge(-halfB, -halfH, d2, halfB, -halfH, d3);
  clipEdge(halfB, -halfH, d3, halfB, halfH, d0);
  if (st.n >= 3) accumulate(st.fx, st.fy);
  const a2 = st.a2;
  if (st.n < 3 || !(a2 > 0)) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    return out;
  }
  out[0] = a2 / 2;
  out[1] = st.cx / (3 * a2);
  out[2] = st.cy / (3 * a2);
  return out;
}

/** Clipping state (module level so the hot loop allocates nothing). */
const st = { n: 0, fx: 0, fy: 0, px: 0, py: 0, a2: 0, cx: 0, cy: 0 };

function accumulate(x: number, y: number): void {
  const cr = st.px * y - x * st.py;
  st.a2 += cr;
  st.cx += (st.px + x) * cr;
  st.cy += (st.py + y) * cr;
}

function emit(x: number, y: number): void {
  if (st.n === 0) {
    st.fx = x;
    st.fy = y;
  } else accumulate(x, y);
  st.px = x;
  st.py = y;
  st.n++;
}

function clipEdge(x1: number, y1: number, d1: number, x2: number, y2: number, d2: number): void {
  const in1 = d1 >= 0;
  const in2 = d2 >= 0;
  if (in1 !== in2) {
    const t = d1 / (d1 - d2);
    emit(x1 + t * (x2 - x1), y1 + t * (y2 - y1));
  }
  if (in2) emit(x2, y2);
}

/**
 * Area and centroid of the compression block of depth `a` (in, measured from the
 * extreme corner) in a rectangle, for a neutral axis inclined to both sides
 * (|ux|, |uy| > 0). Closed form: the region is T(C0) − T(C1) − T(C3) + T(C2), where
 * T(Ci) is the right triangle with its apex at corner i, legs along the sides and depth
 * a − (t0 − ti) (when positive) — inclusion–exclusion of the wedge at the top corner.
 * Falls back to polygon clipping when a side is nearly parallel to the neutral axis
 * (cancellation). Internal hot-loop helper; out = [area, xc, yc].
 * @internal
 */
export function rectangleBlockInto(halfB: number, halfH: number, ux: number, uy: number, a: number, out: Float64Array): void {
  const ax = Math.abs(ux);
  const ay = Math.abs(uy);
  if (ax < 0.05 || ay < 0.05) {
    clipRectangleBlock(halfB, halfH, ux, uy, halfB * ax + halfH * ay - a, out);
    return;
  }
  const sx = ux >= 0 ? 1 : -1;
  const sy = uy >= 0 ? 1 : -1;
  const inv = 1 / (2 * ax * ay);
  // apex depths: C0 top corner, C1 across b, C3 across h, C2 opposite corner
  const wB = 2 * halfB * ax;
  const wH = 2 * halfH * ay;
  let area = 0;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < 4; i++) {
    const acrossB = i === 1 || i === 2;
    const acrossH = i === 2 || i === 3;
    const ai = a - (acrossB ? wB : 0) - (acrossH ? wH : 0);
    if (ai <= 0) continue;
    const cx = acrossB ? -sx * halfB : sx * halfB;
    const cy = acrossH ? -sy * halfH : sy * halfH;
    const ti = ai * ai * inv;
    const gx = cx - (sx * ai) / (3 * ax);
    const gy = cy - (sy * ai) / (3 * ay);
    const sign = i === 2 ? 1 : i === 0 ? 1 : -1;
    area += sign * ti;
    mx += sign * ti * gx;
    my += sign * ti * gy;
  }
  out[0] = area;
  out[1] = area > 0 ? mx / area : 0;
  out[2] = area > 0 ? my / area : 0;
}
