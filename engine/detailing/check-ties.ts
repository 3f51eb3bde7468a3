import { barProperties, tieSizeFor } from "../rebar";
import type { BarSize, DetailingResult, ResolvedSection } from "../types";
import { formatLength } from "./format-length";

/** The largest and smallest longitudinal bars (by diameter, in). @example findBarExtremes(sec).dbMax // 1.0 for #8 bars */
export function findBarExtremes(section: ResolvedSection): { largest: BarSize; dbMax: number; dbMin: number } {
  let largest: BarSize = "#3";
  let dbMax = 0;
  let dbMin = Infinity;
  for (const b of section.bars) {
    if (b.db > dbMax) {
      dbMax = b.db;
      largest = b.size;
    }
    if (b.db < dbMin) dbMin = b.db;
  }
  return { largest, dbMax, dbMin };
}

/**
 * Largest tie spacing, in: min(16 db of the smallest longitudinal bar, 48 dtie, least
 * section dimension) (25.7.2.1, column-checks.md §7.10).
 *
 * @example maxTieSpacing(sec18x22With8s, 0.375) // min(16, 18, 18) = 16
 */
export function maxTieSpacing(section: ResolvedSection, dTie: number): number {
  const { dbMin } = findBarExtremes(section);
  return Math.min(16 * dbMin, 48 * dTie, Math.min(section.b, section.h));
}

/**
 * Tie size (25.7.2.2) and spacing (25.7.2.1) for tied sections. Given ties are checked;
 * derived ones are reported with their basis.
 *
 * @example checkTies(sec) // [{ rule: "tie-size", ... }, { rule: "tie-spacing", ... }]
 */
export function checkTies(section: ResolvedSection, units: "US" | "SI" = "US"): DetailingResult[] {
  const { largest } = findBarExtremes(section);
  const required = tieSizeFor(largest);
  const dReq = barProperties(required).db;
  const t = section.tie;
  const sizeOk = t.db >= dReq - 1e-9;
  const size: DetailingResult = {
    rule: "tie-size",
    clause: "25.7.2.2",
    ok: sizeOk,
    value: t.db,
    limit: dReq,
    unit: "in",
    message: sizeOk
      ? `${t.given ? "given" : "derived"} ${t.size} ties; ${required} is the least size for ${largest} bars`
      : `${t.size} ties are smaller than the ${required} required for ${largest} longitudinal bars`,
  };
  const sMax = maxTieSpacing(section, t.db);
  const spOk = t.spacing <= sMax + 1e-9;
  const spacing: DetailingResult = {
    rule: "tie-spacing",
    clause: "25.7.2.1",
    ok: spOk,
    value: t.spacing,
    limit: sMax,
    unit: "in",
    message: spOk
      ? `${t.given ? "given" : "derived"} tie spacing ${formatLength(t.spacing, units)} ≤ min(16 db, 48 dtie, least dimension) = ${formatLength(sMax, units)}`
      : `tie spacing ${formatLength(t.spacing, units)} exceeds min(16 db, 48 dtie, least dimension) = ${formatLength(sMax, units)}`,
  };
  return [size, spacing];
}
