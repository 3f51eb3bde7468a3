import type { DetailingResult, ResolvedSection } from "../types";

/** Tolerance on ratios so that exactly 1 % or 8 % passes despite round-off. */
const TOL = 1e-9;

/**
 * Longitudinal steel ratio limits 0.01 ≤ Ast/Ag ≤ 0.08 (10.6.1.1); `rhoMax` may lower the
 * upper cap (column-checks.md §7.10).
 *
 * @param section resolved section
 * @param rhoMax optional lower cap (≤ 0.08)
 * @returns the rho-min and rho-max rules
 * @example checkSteelRatio(sec) // [{ rule: "rho-min", ok: true, value: 0.0199, limit: 0.01, ... }, ...]
 */
export function checkSteelRatio(section: ResolvedSection, rhoMax?: number): DetailingResult[] {
  const rho = section.rho;
  const cap = rhoMax !== undefined && rhoMax < 0.08 ? rhoMax : 0.08;
  const min: DetailingResult = { rule: "rho-min", clause: "10.6.1.1", ok: rho >= 0.01 - TOL, value: rho, limit: 0.01, unit: "" };
  if (!min.ok) min.message = `steel ratio ρ = ${rho.toFixed(4)} is below the minimum 0.01: add bars or use larger bars`;
  const max: DetailingResult = { rule: "rho-max", clause: "10.6.1.1", ok: rho <= cap + TOL, value: rho, limit: cap, unit: "" };
  if (!max.ok) {
    max.message = `steel ratio ρ = ${rho.toFixed(4)} exceeds the cap ${cap}${cap < 0.08 ? " (options.rhoMax)" : ""}: enlarge the section or use fewer bars`;
  }
  return [min, max];
}
