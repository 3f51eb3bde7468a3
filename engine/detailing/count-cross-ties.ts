import type { DetailingResult, ResolvedBar, ResolvedSection } from "../types";

/** Cross-ties needed per tie set and the lateral-support rule (25.7.2.3). */
export interface CrossTieCount {
  /** cross-ties running parallel to h, holding bars on the two faces of width b */
  alongH: number;
  /** cross-ties running parallel to b, holding bars on the two faces of width h */
  alongB: number;
  /** alongH + alongB */
  perSet: number;
  /** largest clear distance along a face from an unsupported bar to a held bar, in */
  maxUnsupportedClear: number;
  /** bars on no face of the tie (not enclosed at the perimeter) */
  interiorBars: number;
}

/** Bars within this distance of the outermost bar line count as on that face, in. */
const FACE_TOL = 0.5;
/** 25.7.2.3(b): no unsupported bar farther than 6 in clear from a laterally supported bar. */
const MAX_CLEAR = 6;

/**
 * Greedy count of the extra held bars along one face. The two end bars sit in hoop
 * corners. A bar may stay unsupported only when its neighbour below is held, both
 * neighbours are within 6 in clear, and so "no two neighbouring bars are unsupported"
 * (column-checks.md §7.11).
 */
function countFaceNeeds(face: ResolvedBar[], coord: (b: ResolvedBar) => number): { need: number; maxClear: number } {
  const n = face.length;
  if (n <= 2) return { need: 0, maxClear: 0 };
  face.sort((a, b) => coord(a) - coord(b));
  const held: boolean[] = new Array<boolean>(n).fill(false);
  held[0] = true;
  held[n - 1] = true;
  const clear = (i: number, j: number): number => {
    const a = face[i] as ResolvedBar;
    const b = face[j] as ResolvedBar;
    return Math.abs(coord(b) - coord(a)) - (a.db + b.db) / 2;
  };
  let need = 0;
  let maxClear = 0;
  for (let i = 1; i < n - 1; i++) {
    if (held[i]) continue;
    const ok = held[i - 1] === true && clear(i - 1, i) <= MAX_CLEAR + 1e-9 && clear(i, i + 1) <= MAX_CLEAR + 1e-9;
    if (ok) {
      // leave bar i unsupported; its upper neighbour must then be held
      maxClear = Math.max(maxClear, clear(i - 1, i), clear(i, i + 1));
      if (!held[i + 1]) {
        held[i + 1] = true;
        if (i + 1 < n - 1) need++;
      }
      i++; // bar i + 1 is now decided (held)
    } else {
      held[i] = true;
      need++;
    }
  }
  return { need, maxClear };
}

/**
 * Cross-ties per tie set so that every corner and alternate bar is held by a tie corner and
 * no unsupported bar is more than 6 in clear from a held bar (25.7.2.3); per pair of opposite
 * faces the larger need governs (column-checks.md §7.11). Circular ties and spirals support
 * every bar on the circle (25.7.2.3), so circles need none.
 *
 * @example countCrossTies(rect18x22_4x4) // { alongH: 1, alongB: 1, perSet: 2, ... } when the bars are > 6 in apart
 */
export function countCrossTies(section: ResolvedSection): CrossTieCount {
  const bars = section.bars;
  if (section.shape === "circle" || bars.length === 0) {
    return { alongH: 0, alongB: 0, perSet: 0, maxUnsupportedClear: 0, interiorBars: 0 };
  }
  let xmin = Infinity;
  let xmax = -Infinity;
  let ymin = Infinity;
  let ymax = -Infinity;
  for (const b of bars) {
    if (b.x < xmin) xmin = b.x;
    if (b.x > xmax) xmax = b.x;
    if (b.y < ymin) ymin = b.y;
    if (b.y > ymax) ymax = b.y;
  }
  const top: ResolvedBar[] = [];
  const bottom: ResolvedBar[] = [];
  const left: ResolvedBar[] = [];
  const right: ResolvedBar[] = [];
  let interior = 0;
  for (const b of bars) {
    const onTop = b.y >= ymax - FACE_TOL;
    const onBottom = b.y <= ymin + FACE_TOL && ymax - ymin > FACE_TOL;
    const onRight = b.x >= xmax - FACE_TOL;
    const onLeft = b.x <= xmin + FACE_TOL && xmax - xmin > FACE_TOL;
    if (onTop) top.push(b);
    if (onBottom) bottom.push(b);
    if (onRight) right.push(b);
    if (onLeft) left.push(b);
    if (!onTop && !onBottom && !onRight && !onLeft) interior++;
  }
  const bx = (b: ResolvedBar) => b.x;
  const by = (b: ResolvedBar) => b.y;
  const t = countFaceNeeds(top, bx);
  const bo = countFaceNeeds(bottom, bx);
  const l = countFaceNeeds(left, by);
  const r = countFaceNeeds(right, by);
  const alongH = Math.max(t.need, bo.need);
  const alongB = Math.max(l.need, r.need);
  return {
    alongH,
    alongB,
    perSet: alongH + alongB,
    maxUnsupportedClear: Math.max(t.maxClear, bo.maxClear, l.maxClear, r.maxClear),
    interiorBars: interior,
  };
}

/**
 * The lateral-support rule as data (25.7.2.3): cross-ties are added as needed (so the rule
 * holds) unless bars lie inside the perimeter, where no tie corner can hold them.
 *
 * @example checkLateralSupport(sec, countCrossTies(sec)) // { rule: "lateral-support", ok: true, value: 4.2, limit: 6, ... }
 */
export function checkLateralSupport(section: ResolvedSection, ct: CrossTieCount): DetailingResult {
  const ok = ct.interiorBars === 0;
  const r: DetailingResult = {
    rule: "lateral-support",
    clause: "25.7.2.3",
    ok,
    value: ct.maxUnsupportedClear,
    limit: MAX_CLEAR,
    unit: "in",
    message:
      section.shape === "circle"
        ? `bars on a circle are held by the ${section.confinement === "spiral" ? "spiral" : "circular ties"}; no cross-ties`
        : `${ct.perSet} cross-tie${ct.perSet === 1 ? "" : "s"} per tie set (${ct.alongH} parallel to h, ${ct.alongB} parallel to b) hold every corner and alternate bar within 6 in clear`,
  };
  if (!ok) r.message = `${ct.interiorBars} bar(s) lie inside the perimeter, where no tie corner holds them: place every bar at the tie perimeter`;
  return r;
}
