import type { CheckOptions, DetailingResult, ResolvedSection } from "../types";
import { formatLength } from "./format-length";

/**
 * Minimum specified cover to the ties or spiral, in (Table 20.5.1.3.1): 1.5 in not exposed
 * to weather or ground; 2 in exposed with #6 bars and larger (1.5 in for #5 and smaller);
 * 3 in cast against and permanently in contact with earth.
 *
 * @param exposure "interior" (default) | "exposed" | "earth"
 * @param dbMax diameter of the largest longitudinal bar, in
 * @example minimumCover("exposed", 1.0) // 2
 */
export function minimumCover(exposure: NonNullable<CheckOptions["exposure"]>, dbMax: number): number {
  if (exposure === "earth") return 3;
  // #6 has db = 0.75 in; metric 19 has 19.1 mm = 0.752 in
  if (exposure === "exposed") return dbMax >= 0.75 - 1e-6 ? 2 : 1.5;
  return 1.5;
}

/**
 * Clear cover to the ties against the exposure's minimum (Table 20.5.1.3.1, column-checks.md §7.10).
 *
 * @example checkCover(sec, "interior") // { rule: "cover", value: 1.5, limit: 1.5, ok: true, ... }
 */
export function checkCover(
  section: ResolvedSection,
  exposure: NonNullable<CheckOptions["exposure"]> = "interior",
  units: "US" | "SI" = "US",
): DetailingResult {
  let dbMax = 0;
  for (const b of section.bars) if (b.db > dbMax) dbMax = b.db;
  const limit = minimumCover(exposure, dbMax);
  const ok = section.cover >= limit - 1e-9;
  const r: DetailingResult = { rule: "cover", clause: "20.5.1.3.1", ok, value: section.cover, limit, unit: "in" };
  if (!ok) r.message = `clear cover ${formatLength(section.cover, units)} is less than ${formatLength(limit, units)} required for ${exposure} exposure`;
  return r;
}
