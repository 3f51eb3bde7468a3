import type { DetailingResult, ResolvedSection } from "../types";

/**
 * Minimum number of longitudinal bars (10.7.3.1): 4 within rectangular or circular ties,
 * 6 enclosed by a spiral.
 *
 * @example checkBarCount(sec) // { rule: "bar-count", ok: true, value: 12, limit: 4, ... }
 */
export function checkBarCount(section: ResolvedSection): DetailingResult {
  const limit = section.confinement === "spiral" ? 6 : 4;
  const n = section.bars.length;
  const r: DetailingResult = { rule: "bar-count", clause: "10.7.3.1", ok: n >= limit, value: n, limit, unit: "" };
  if (!r.ok) r.message = `${n} longitudinal bars; at least ${limit} are needed ${section.confinement === "spiral" ? "inside a spiral" : "with ties"}`;
  return r;
}
