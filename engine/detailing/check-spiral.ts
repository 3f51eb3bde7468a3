import type { DetailingResult, ResolvedSection } from "../types";
import { formatLength } from "./format-length";

/**
 * Minimum spiral ratio ρs,min = 0.45 (Ag/Ach − 1) f'c/fyt (25.7.3.3) and the provided
 * ρs = 4 Asp / (Dch s) with Dch the core diameter to the outside of the spiral
 * (common practice form of the volumetric ratio). fyt is taken as the section's fy.
 *
 * @param section a circular section with a spiral
 * @param spiralArea area of the spiral bar, in²
 * @example computeSpiralRatio(sec, 0.11) // { rho: 0.0102, rhoMin: 0.0094 }
 */
export function computeSpiralRatio(section: ResolvedSection, spiralArea: number): { rho: number; rhoMin: number } {
  const Dch = section.D - 2 * section.cover;
  const Ach = (Math.PI * Dch * Dch) / 4;
  const rhoMin = 0.45 * (section.Ag / Ach - 1) * (section.fc / section.fy);
  return { rho: (4 * spiralArea) / (Dch * section.tie.spacing), rhoMin };
}

/**
 * Spiral rules: ratio (25.7.3.3), clear pitch between max(1 in, 4/3 dagg) and 3 in
 * (25.7.3.1), bar diameter ≥ 3/8 in (25.7.3.2).
 *
 * @param section circular spiral section
 * @param spiralArea spiral bar area, in²
 * @param dagg maximum aggregate size, in
 * @example checkSpiral(sec, 0.11, 0.75)
 */
export function checkSpiral(section: ResolvedSection, spiralArea: number, dagg = 0.75, units: "US" | "SI" = "US"): DetailingResult[] {
  const { rho, rhoMin } = computeSpiralRatio(section, spiralArea);
  const clear = section.tie.spacing - section.tie.db;
  const minClear = Math.max(1, (4 / 3) * dagg);
  const out: DetailingResult[] = [];
  const ratio: DetailingResult = { rule: "spiral-ratio", clause: "25.7.3.3", ok: rho >= rhoMin - 1e-9, value: rho, limit: rhoMin, unit: "" };
  if (!ratio.ok) ratio.message = `spiral ratio ρs = ${rho.toFixed(4)} is below 0.45 (Ag/Ach − 1) f'c/fyt = ${rhoMin.toFixed(4)}: reduce the pitch or use a larger spiral bar`;
  out.push(ratio);
  const pmax: DetailingResult = { rule: "spiral-pitch-max", clause: "25.7.3.1", ok: clear <= 3 + 1e-9, value: clear, limit: 3, unit: "in" };
  if (!pmax.ok) pmax.message = `clear spiral pitch ${formatLength(clear, units)} exceeds 3 in`;
  out.push(pmax);
  const pmin: DetailingResult = { rule: "spiral-pitch-min", clause: "25.7.3.1", ok: clear >= minClear - 1e-9, value: clear, limit: minClear, unit: "in" };
  if (!pmin.ok) pmin.message = `clear spiral pitch ${formatLength(clear, units)} is less than max(1 in, 4/3 dagg) = ${formatLength(minClear, units)}: use a larger spiral bar`;
  out.push(pmin);
  // 3/8 in; the soft-metric No. 10 bar (9.5 mm = 0.374 in) is the same bar, hence the small tolerance
  const size: DetailingResult = { rule: "spiral-size", clause: "25.7.3.2", ok: section.tie.db >= 0.375 - 0.002, value: section.tie.db, limit: 0.375, unit: "in" };
  if (!size.ok) size.message = `spiral bar diameter ${formatLength(section.tie.db, units)} is less than 3/8 in`;
  out.push(size);
  return out;
}
