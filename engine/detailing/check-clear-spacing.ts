import type { DetailingResult, ResolvedSection } from "../types";
import { formatLength } from "./format-length";

/**
 * Smallest clear distance between any two longitudinal bars, in (centre distance less
 * the two radii). Infinity with fewer than two bars.
 *
 * @example computeMinClearSpacing(sec) // 4.6
 */
export function computeMinClearSpacing(section: ResolvedSection): number {
  const bars = section.bars;
  let min = Infinity;
  for (let i = 0; i < bars.length; i++) {
    const a = bars[i];
    if (a === undefined) continue;
    for (let j = i + 1; j < bars.length; j++) {
      const b = bars[j];
      if (b === undefined) continue;
      const c = Math.hypot(a.x - b.x, a.y - b.y) - (a.db + b.db) / 2;
      if (c < min) min = c;
    }
  }
  return min;
}

/**
 * Clear spacing between longitudinal bars ≥ max(1.5 in, 1.5 db, 4/3 dagg) (25.2.3), with
 * db of the largest bar (column-checks.md §7.10).
 *
 * @param section resolved section
 * @param dagg nominal maximum aggregate size, in (default 0.75, common practice)
 * @example checkClearSpacing(sec, 0.75) // { rule: "clear-spacing", value: 4.6, limit: 1.5, ... }
 */
export function checkClearSpacing(section: ResolvedSection, dagg = 0.75, units: "US" | "SI" = "US"): DetailingResult {
  let dbMax = 0;
  for (const b of section.bars) if (b.db > dbMax) dbMax = b.db;
  const limit = Math.max(1.5, 1.5 * dbMax, (4 / 3) * dagg);
  const min = computeMinClearSpacing(section);
  const value = Number.isFinite(min) ? min : 0;
  const ok = !Number.isFinite(min) || min >= limit - 1e-9;
  const r: DetailingResult = { rule: "clear-spacing", clause: "25.2.3", ok, value, limit, unit: "in" };
  if (!ok) {
    r.message = `clear spacing between bars ${formatLength(value, units)} is less than ${formatLength(limit, units)} = max(1.5 in, 1.5 db, 4/3 dagg): use fewer or smaller bars, or a larger section`;
  }
  return r;
}
