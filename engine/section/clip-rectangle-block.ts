/**
 * Exact area and centroid of the part of a rectangle on the compression side of a
 * straight line: the rectangle [−b/2, b/2] × [−h/2, h/2] clipped by the half-plane
 * x·ux + y·uy ≥ tCut (polygon clipping, then the shoelace formula).
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
  // Corners counter-clockwise; Sutherland–Hodgman with a single clipping edge,
  // accumulating the shoelace sums as vertices are emitted (no allocation).
  let n = 0;
  let fx = 0;
  let fy = 0;
  let px = 0;
  let py = 0;
  let a2 = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < 4; i++) {
    const x1 = i === 0 || i === 3 ? halfB : -halfB;
    const y1 = i < 2 ? halfH : -halfH;
    const j = (i + 1) & 3;
    const x2 = j === 0 || j === 3 ? halfB : -halfB;
    const y2 = j < 2 ? halfH : -halfH;
    const d1 = x1 * ux + y1 * uy - tCut;
    const d2 = x2 * ux + y2 * uy - tCut;
    const in1 = d1 >= 0;
    const in2 = d2 >= 0;
    // emit intersection when the edge crosses, then the end vertex when it is inside
    for (let k = 0; k < 2; k++) {
      let ex: number;
      let ey: number;
      if (k === 0) {
        if (in1 === in2) continue;
        const t = d1 / (d1 - d2);
        ex = x1 + t * (x2 - x1);
        ey = y1 + t * (y2 - y1);
      } else {
        if (!in2) continue;
        ex = x2;
        ey = y2;
      }
      if (n === 0) {
        fx = ex;
        fy = ey;
      } else {
        const cr = px * ey - ex * py;
        a2 += cr;
        cx += (px + ex) * cr;
        cy += (py + ey) * cr;
      }
      px = ex;
      py = ey;
      n++;
    }
  }
  if (n >= 3) {
    const cr = px * fy - fx * py;
    a2 += cr;
    cx += (px + fx) * cr;
    cy += (py + fy) * cr;
  }
  if (n < 3 || a2 <= 0) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    return out;
  }
  out[0] = a2 / 2;
  out[1] = cx / (3 * a2);
  out[2] = cy / (3 * a2);
  return out;
}
